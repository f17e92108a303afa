// The order's job sheet: the revision's template tiled at the order's girth, then the order's
// own section (job-sheet-order.ts), the cut list, hardware, punches, the steps to tick and the
// cautions (the print module's job sheet), with the order and its girth on the title block and
// its number and due date on every footer. Each print is logged on the order (who, when, which paper).
import type { Knex } from 'knex';
import { formatLength } from '@shared/units/format-length.ts';
import { writeTransaction } from '../../db/write-transaction.ts';
import { HttpError } from '../../http/http-error.ts';
import type { AuthContext } from '../../http/session.ts';
import { printErrorToHttp, printRevision, type PaperId, type PrintedFile } from '../print/index.ts';
import { jobSheetOrderSection } from './job-sheet-order.ts';
import { fittedOf, priceContext, priceOf } from './order-view.ts';
import type { ListedOrderRow, OrdersRepository } from './orders.repository.ts';

export async function printJobSheet(db: Knex, orders: OrdersRepository, now: () => number, auth: AuthContext, row: ListedOrderRow, paper: Exclude<PaperId, 'custom'>): Promise<PrintedFile> {
  const fitted = fittedOf(row);
  if (!fitted) throw new HttpError(409, 'girth_missing', `Order ${row.number} has no girth yet: the job sheet prints once the wearer is measured.`);
  const girth = formatLength(fitted.girthMm, fitted.spec.units);
  const order = `Order ${row.number}`;
  // Short: it shares the one footer line of every page with the cautions, which must stay whole.
  const footer = `${order} · due ${row.due_date}`;
  const price = priceOf(row, fitted, await priceContext(db, row.shop_id));
  let file: PrintedFile;
  try {
    file = await printRevision(
      { ...fitted.spec, sizes: [] },
      { paper, jobSheet: true },
      {
        patternName: row.pattern_name,
        revision: row.revision_number,
        date: new Date(Number(row.created_at)),
        sizes: [],
        revisionNote: `${order} at ${girth} girth${row.size_name ? ` (size ${row.size_name})` : ''}`,
        footerNote: footer,
        jobSheetOrder: jobSheetOrderSection(row, price),
      },
      'pdf',
    );
  } catch (err) {
    throw printErrorToHttp(err);
  }
  await writeTransaction(db, async (trx) => {
    const t = now();
    await orders.logPrint(trx, { order_id: row.id, user_id: auth.user.id, paper, at: t });
    await orders.record(trx, { order_id: row.id, user_id: auth.user.id, kind: 'printed', summary: `Job sheet printed on ${paper === 'a4' || paper === 'a3' ? paper.toUpperCase() : paper} paper at ${girth} girth.`, detail: { paper }, at: t });
  });
  return { ...file, fileName: `order-${row.number}-${file.fileName}` };
}
