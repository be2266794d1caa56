/**
 * Command-line arguments of `npm run calc`, parsed with node:util parseArgs into a command. Bad arguments
 * come back as one line of text for stderr; the script exits with code 2.
 */
import { parseArgs } from 'node:util';
import type { AnalyseWindingInput } from '../engine/analyse-winding';
import type { ScalingCase } from '../engine/supply-scaling';

/** Usage text for --help. */
export const CALC_USAGE = `Usage:
  npm run calc -- winding --slots 36 --poles 4 --span 7 [--layers 1|2] [--json]
      [--style lap|concentric] [--spans 11,9,7] [--turns 14 | 10,10,10] [--coiling whole|half]
      [--paths 1] [--connection star|delta] [--frequency 50] [--orders 25]
  npm run calc -- sheet FILE.json [--orders 25] [--json]
  npm run calc -- rescale --slots 36 --poles 4 --span 7 --turns 14 --voltage 400 --frequency 50
      [--connection star] [--paths 1] [--layers 2] [--style lap] [--spans …]
      [--to-voltage 460] [--to-frequency 60] [--to-connection delta] [--to-turns 16] [--to-span 8]
      [--to-paths 2] [--to-poles 6] [--json]
      The same core on another supply: flux and flux-density ratios, the verdict (+5 % / −10 %), and the turns
      per coil that would keep the original flux.
Spans are slot pitches: a coil in slots 1 and 8 has span 7.`;

/** A parsed command line. */
export type CalcCommand =
  | { kind: 'winding'; input: AnalyseWindingInput; orders: number; json: boolean }
  | { kind: 'sheet'; file: string; orders: number; json: boolean }
  | { kind: 'rescale'; old: ScalingCase; next: ScalingCase; json: boolean }
  | { kind: 'help' };

/** A command, or one line saying what is wrong. */
export type ArgsResult = { ok: true; value: CalcCommand } | { ok: false; message: string };

const OPTIONS = {
  slots: { type: 'string' },
  poles: { type: 'string' },
  span: { type: 'string' },
  spans: { type: 'string' },
  layers: { type: 'string' },
  style: { type: 'string' },
  turns: { type: 'string' },
  coiling: { type: 'string' },
  paths: { type: 'string' },
  connection: { type: 'string' },
  frequency: { type: 'string' },
  orders: { type: 'string' },
  voltage: { type: 'string' },
  'to-voltage': { type: 'string' },
  'to-frequency': { type: 'string' },
  'to-connection': { type: 'string' },
  'to-turns': { type: 'string' },
  'to-span': { type: 'string' },
  'to-paths': { type: 'string' },
  'to-poles': { type: 'string' },
  json: { type: 'boolean' },
  help: { type: 'boolean', short: 'h' },
} as const;

class ArgError extends Error {}

function numberList(name: string, raw: string): number[] {
  const values = raw.split(',').map((s) => s.trim());
  return values.map((s) => {
    const n = Number(s);
    if (s === '' || !Number.isFinite(n))
      throw new ArgError(`--${name} must be a number or a comma-separated list of numbers, not "${raw}".`);
    return n;
  });
}

function one(name: string, raw: string | undefined, fallback?: number): number {
  if (raw === undefined) {
    if (fallback === undefined) throw new ArgError(`--${name} is required.`);
    return fallback;
  }
  const [n, ...rest] = numberList(name, raw);
  if (n === undefined || rest.length > 0) throw new ArgError(`--${name} takes one number, not "${raw}".`);
  return n;
}

function choice<T extends string>(name: string, raw: string | undefined, allowed: readonly T[], fallback: T): T {
  if (raw === undefined) return fallback;
  const hit = allowed.find((a) => a === raw);
  if (!hit) throw new ArgError(`--${name} must be ${allowed.join(' or ')}, not "${raw}".`);
  return hit;
}

type Values = ReturnType<typeof parseArgs<{ options: typeof OPTIONS; allowPositionals: true }>>['values'];

function windingCommand(v: Values, orders: number, json: boolean): CalcCommand {
  const slots = one('slots', v.slots);
  const poles = one('poles', v.poles);
  if (v.span !== undefined && v.spans !== undefined) throw new ArgError('Give --span or --spans, not both.');
  const spansRaw = v.spans ?? v.span;
  if (spansRaw === undefined) throw new ArgError('--span is required (slot pitches: "1–8" is 7).');
  const spans = numberList(v.spans !== undefined ? 'spans' : 'span', spansRaw);
  const style = choice('style', v.style, ['lap', 'concentric'] as const, spans.length > 1 ? 'concentric' : 'lap');
  const layersN = one('layers', v.layers, 2);
  if (layersN !== 1 && layersN !== 2) throw new ArgError(`--layers must be 1 or 2, not "${v.layers}".`);
  const turnsList = v.turns === undefined ? spans.map(() => 10) : numberList('turns', v.turns);
  const turnsPerCoil = turnsList.length === 1 && spans.length > 1 ? spans.map(() => turnsList[0] ?? 10) : turnsList;
  const coiling = v.coiling === undefined ? undefined : choice('coiling', v.coiling, ['whole', 'half'] as const, 'half');
  return {
    kind: 'winding',
    orders,
    json,
    input: {
      winding: {
        slots,
        poles,
        layers: layersN,
        style,
        spans,
        turnsPerCoil,
        ...(coiling ? { singleLayerCoiling: coiling } : {}),
        parallelPaths: one('paths', v.paths, 1),
        connection: choice('connection', v.connection, ['star', 'delta'] as const, 'star'),
      },
      supply: { lineVoltageV: 400, frequencyHz: one('frequency', v.frequency, 50) },
      options: { maxOrder: Math.max(orders, 49) },
    },
  };
}

/** The same core moved to another supply: unchanged `--to-…` values keep the original's. */
function rescaleCommand(v: Values, json: boolean): CalcCommand {
  const base = windingCommand(v, 25, json);
  if (base.kind !== 'winding') throw new ArgError('rescale needs a winding.');
  const w = base.input.winding;
  const spans = v['to-span'] === undefined ? w.spans : numberList('to-span', v['to-span']);
  const turns = v['to-turns'] === undefined ? w.turnsPerCoil : numberList('to-turns', v['to-turns']);
  const old: ScalingCase = {
    winding: w,
    supply: { lineVoltageV: one('voltage', v.voltage), frequencyHz: one('frequency', v.frequency, 50) },
  };
  const next: ScalingCase = {
    winding: {
      ...w,
      spans,
      turnsPerCoil: turns.length === 1 && spans.length > 1 ? spans.map(() => turns[0] ?? 1) : turns,
      poles: one('to-poles', v['to-poles'], w.poles),
      parallelPaths: one('to-paths', v['to-paths'], w.parallelPaths),
      connection: choice('to-connection', v['to-connection'], ['star', 'delta'] as const, w.connection),
    },
    supply: {
      lineVoltageV: one('to-voltage', v['to-voltage'], old.supply.lineVoltageV),
      frequencyHz: one('to-frequency', v['to-frequency'], old.supply.frequencyHz),
    },
  };
  return { kind: 'rescale', old, next, json };
}

/** Parses argv (without node and the script path). */
export function parseCalcArgs(argv: readonly string[]): ArgsResult {
  try {
    const { values: v, positionals } = parseArgs({ args: [...argv], options: OPTIONS, allowPositionals: true, strict: true });
    if (v.help) return { ok: true, value: { kind: 'help' } };
    const [command, ...rest] = positionals;
    const json = v.json ?? false;
    const orders = one('orders', v.orders, 25);
    if (!Number.isInteger(orders) || orders < 1 || orders > 99)
      throw new ArgError(`--orders must be a whole number from 1 to 99, not "${v.orders}".`);
    if (command === 'winding') {
      if (rest.length > 0) throw new ArgError(`Unexpected argument "${rest[0]}".`);
      return { ok: true, value: windingCommand(v, orders, json) };
    }
    if (command === 'rescale') {
      if (rest.length > 0) throw new ArgError(`Unexpected argument "${rest[0]}".`);
      return { ok: true, value: rescaleCommand(v, json) };
    }
    if (command === 'sheet') {
      const [file, ...extra] = rest;
      if (!file) throw new ArgError('sheet needs a file: npm run calc -- sheet FILE.json');
      if (extra.length > 0) throw new ArgError(`Unexpected argument "${extra[0]}".`);
      return { ok: true, value: { kind: 'sheet', file, orders, json } };
    }
    throw new ArgError(
      command
        ? `Unknown command "${command}" (use winding, sheet or rescale).`
        : 'Give a command: winding, sheet or rescale (--help for usage).',
    );
  } catch (e) {
    // parseArgs throws TypeErrors with Node error codes for unknown options and missing values.
    const message = e instanceof Error ? (e.message.split('\n')[0] ?? e.message) : String(e);
    return { ok: false, message };
  }
}
