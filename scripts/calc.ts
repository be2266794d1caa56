/**
 * Winding calculations from the command line (`npm run calc -- …`, see CALC_USAGE). Exit codes: 0 done,
 * 2 bad arguments, unreadable or invalid file, or input the engine rejects (one line on stderr).
 */
import { readFileSync } from 'node:fs';
import { analyseSheet, windingInputFromSheet } from '@/lib/engine/analyse-sheet';
import { sheetFindings } from '@/lib/engine/sheet-findings';
import { analyseWinding } from '@/lib/engine/analyse-winding';
import { CALC_USAGE, parseCalcArgs } from '@/lib/cli/args';
import { formatSheet } from '@/lib/cli/format-sheet';
import { formatWinding } from '@/lib/cli/format-winding';
import { formatRescale } from '@/lib/cli/format-rescale';
import { supplyScaling } from '@/lib/engine/supply-scaling';
import type { EngineError } from '@/lib/engine/result';
import { parseWindingSheetExport, windingSheetSchema } from '@/lib/as-found/winding-sheet-schema';

function die(message: string): never {
  process.stderr.write(`calc: ${message.replace(/\s*\n\s*/g, ' ')}\n`);
  process.exit(2);
}

const engineMessage = (e: EngineError): string => `${e.field ? `${e.field}: ` : ''}${e.message} ${e.hint}`;

function readJson(file: string): unknown {
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch (e) {
    die(`cannot read ${file}: ${e instanceof Error ? e.message : String(e)}`);
  }
  try {
    return JSON.parse(text);
  } catch (e) {
    die(`${file} is not valid JSON: ${e instanceof Error ? e.message : String(e)}`);
  }
}

function main(argv: readonly string[]): void {
  const parsed = parseCalcArgs(argv);
  if (!parsed.ok) die(`${parsed.message} (--help for usage)`);
  const cmd = parsed.value;
  if (cmd.kind === 'help') {
    process.stdout.write(`${CALC_USAGE}\n`);
    return;
  }
  if (cmd.kind === 'winding') {
    const r = analyseWinding(cmd.input);
    if (!r.ok) die(engineMessage(r.error));
    process.stdout.write(cmd.json ? `${JSON.stringify(r.value, null, 2)}\n` : `${formatWinding(cmd.input.winding, r.value, cmd.orders)}\n`);
    return;
  }
  if (cmd.kind === 'rescale') {
    const r = supplyScaling(cmd.old, cmd.next);
    if (!r.ok) die(engineMessage(r.error));
    process.stdout.write(cmd.json ? `${JSON.stringify(r.value, null, 2)}\n` : `${formatRescale(cmd.old, cmd.next, r.value)}\n`);
    return;
  }
  const data = readJson(cmd.file);
  // An export file carries the wrapper; a bare sheet object is accepted too.
  const isExport = typeof data === 'object' && data !== null && 'format' in data;
  const sheetResult = isExport ? parseWindingSheetExport(data) : null;
  let sheet;
  if (sheetResult) {
    if (!sheetResult.ok) die(`${cmd.file}: ${sheetResult.issues.map((i) => `${i.path || '(file)'}: ${i.message}`).join('; ')}`);
    sheet = sheetResult.value.sheet;
  } else {
    const bare = windingSheetSchema.safeParse(data);
    if (!bare.success) die(`${cmd.file}: ${bare.error.issues.map((i) => `${i.path.join('.') || '(file)'}: ${i.message}`).join('; ')}`);
    sheet = bare.data;
  }
  const r = analyseSheet(sheet);
  if (!r.ok) die(`${cmd.file}: ${engineMessage(r.error)}`);
  const findings = sheetFindings(sheet, r.value);
  process.stdout.write(
    cmd.json
      ? `${JSON.stringify({ ...r.value, findings }, null, 2)}\n`
      : `${formatSheet(windingInputFromSheet(sheet).winding, r.value, findings, cmd.orders)}\n`,
  );
}

main(process.argv.slice(2));
