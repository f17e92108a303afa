// Column types PostgreSQL returns as strings, read as numbers like SQLite returns them.
//
// node-postgres hands back int8 (our bigInteger times in ms, and every count(*)) and numeric
// as strings, because they can exceed JavaScript's safe integers. Ours never do (a time in ms
// stays below 2^53 for 285,000 years), and the repositories expect the numbers SQLite gives.
import pg from 'pg';

const INT8 = 20;
const NUMERIC = 1700;

function toNumber(text: string): number {
  const n = Number(text);
  if (!Number.isSafeInteger(n) && Number.isInteger(n)) throw new RangeError(`database integer ${text} is beyond JavaScript's safe range`);
  return n;
}

/** Per-connection type parsers (`types` of a pg.Client), leaving pg's global table alone. */
export const pgTypes = {
  getTypeParser: (oid: number, format?: string) =>
    oid === INT8 || oid === NUMERIC ? toNumber : pg.types.getTypeParser(oid, format === 'binary' ? 'binary' : 'text'),
};
