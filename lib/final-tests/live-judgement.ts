/**
 * Verdicts while the winder types. The form's values are not yet valid as a whole (half a section is
 * normal mid-entry), so each section is parsed on its own and a field that does not parse yet is left out
 * instead of hiding the whole section's verdict. The saved verdict is always the server's judgement of the
 * fully validated record; this only previews it.
 */
import type { z } from 'zod';
import {
  hipotSectionSchema,
  irSectionSchema,
  resistanceSectionSchema,
  runSectionSchema,
  surgeSectionSchema,
  testBasisSchema,
  type TestDataValues,
} from '@/lib/final-tests/test-record-schema';
import { judgeTestRecord, type TestJudgement } from './verdicts';

type Obj = Record<string, unknown>;
const isObj = (v: unknown): v is Obj => typeof v === 'object' && v !== null;

function unsetPath(root: unknown, path: readonly PropertyKey[]): boolean {
  let node: unknown = root;
  for (let i = 0; i < path.length - 1; i++) {
    if (!isObj(node)) return false;
    node = node[path[i] as string];
  }
  const last = path.at(-1);
  if (!isObj(node) || last === undefined) return false;
  if (Array.isArray(node)) node[Number(last)] = undefined;
  else delete node[last as string];
  return true;
}

/** Parses `raw`, blanking each field the schema rejects, for a few rounds; null when it still fails. */
export function parseLeniently<S extends z.ZodType>(schema: S, raw: unknown): z.output<S> | null {
  let value: unknown = structuredClone(isObj(raw) ? raw : {});
  for (let round = 0; round < 4; round++) {
    const r = schema.safeParse(value);
    if (r.success) return r.data;
    const removed = r.error.issues.map((i) => unsetPath(value, i.path)).some(Boolean);
    if (!removed) return null;
    value = structuredClone(value);
  }
  return null;
}

/** Sections that could not be parsed at all are judged as not recorded. */
const EMPTY = {
  hipot: { case: 'new', practice: 'nema', kind: 'dc' },
  surge: { phases: [{}, {}, {}] },
  resistance: { between: 'line-to-line', readings: [undefined, undefined, undefined], referenceTemperatureC: 25 },
  run: { currentsA: [undefined, undefined, undefined] },
} as const;

/** The form values as far as they can be read, or null while the basis (rated voltage, class...) is incomplete. */
export function lenientTestData(values: unknown): TestDataValues | null {
  const v = isObj(values) ? values : {};
  const basis = testBasisSchema.safeParse(v.basis);
  if (!basis.success) return null;
  const or = <T>(x: T | null, fallback: () => T): T => x ?? fallback();
  return {
    basis: basis.data,
    ir: or(parseLeniently(irSectionSchema, v.ir), () => irSectionSchema.parse({})),
    hipot: or(parseLeniently(hipotSectionSchema, v.hipot), () => hipotSectionSchema.parse(EMPTY.hipot)),
    surge: or(parseLeniently(surgeSectionSchema, v.surge), () => surgeSectionSchema.parse(EMPTY.surge)),
    resistance: or(parseLeniently(resistanceSectionSchema, v.resistance), () => resistanceSectionSchema.parse(EMPTY.resistance)),
    run: or(parseLeniently(runSectionSchema, v.run), () => runSectionSchema.parse(EMPTY.run)),
    notes: undefined,
  };
}

/** The live judgement of a form, or null while the basis is incomplete. */
export function liveJudgement(values: unknown): TestJudgement | null {
  const data = lenientTestData(values);
  return data ? judgeTestRecord(data) : null;
}
