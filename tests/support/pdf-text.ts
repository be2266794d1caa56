/**
 * The text of a PDF, read back with poppler's pdftotext (installed by scripts/ensure-chromium.sh) keeping the
 * layout, so a label and its value land on one line; whitespace is then collapsed to single spaces.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

export function pdfText(pdf: Uint8Array): string {
  const dir = mkdtempSync(join(tmpdir(), 'cw-pdf-'));
  try {
    const file = join(dir, 'sheet.pdf');
    writeFileSync(file, pdf);
    const r = spawnSync(process.env.PDFTOTEXT_PATH ?? 'pdftotext', ['-layout', '-enc', 'UTF-8', file, '-'], { encoding: 'utf8' });
    if (r.status !== 0) throw new Error(`pdftotext failed: ${r.stderr || r.error?.message}`);
    return r.stdout.replace(/\s+/g, ' ');
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
