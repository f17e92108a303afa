// Fails the test run at once when a system tool the suite needs is missing, with the line
// that installs it, instead of letting tests skip silently.
import { execFileSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { POSTGRES_APT_PACKAGE, postgresBinDir } from './helpers/pg-cluster.ts';

const needs = [
  { what: 'Chromium (end-to-end tests)', found: () => existsSync('/usr/bin/chromium'), pkg: 'chromium' },
  { what: 'pdftoppm (PDF scale tests)', found: () => onPath('pdftoppm'), pkg: 'poppler-utils' },
  { what: 'pdffonts (PDF font tests)', found: () => onPath('pdffonts'), pkg: 'poppler-utils' },
  // The API suite runs a second time on a throwaway PostgreSQL cluster (tests/pg/global-setup.ts).
  { what: 'PostgreSQL server binaries: initdb, pg_ctl (API tests on PostgreSQL)', found: () => postgresBinDir() !== null, pkg: POSTGRES_APT_PACKAGE },
];

function onPath(cmd: string): boolean {
  try {
    execFileSync('sh', ['-c', `command -v ${cmd}`], { stdio: 'ignore' });
    return true;
  } catch {
    return false;
  }
}

const missing = needs.filter((n) => !n.found());
if (missing.length > 0) {
  const pkgs = [...new Set(missing.map((m) => m.pkg))].join(' ');
  for (const m of missing) console.error(`missing: ${m.what}`);
  console.error(`install with: sudo apt-get update && sudo apt-get install -y ${pkgs}`);
  process.exit(1);
}
