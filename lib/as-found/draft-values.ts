/**
 * Restores form values from a stored draft. The draft was shape-checked on the way in, but the form may
 * have gained or lost fields since: every value is taken from the draft where it is a string in the right
 * place and from the blank form otherwise, so a restored draft always fits the current form.
 */
import type { DraftPayload } from '@/lib/as-found/draft-schema';
import { blankWire, emptySheetForm, type SheetFormValues } from './as-found-form';

type Dict = Record<string, unknown>;
const isDict = (v: unknown): v is Dict => typeof v === 'object' && v !== null && !Array.isArray(v);

function pickStrings<T extends object>(template: T, from: unknown): T {
  if (!isDict(from)) return template;
  const out: Dict = { ...(template as Dict) };
  for (const [k, v] of Object.entries(template as Dict)) if (typeof v === 'string' && typeof from[k] === 'string') out[k] = from[k];
  return out as T;
}

/** Form values from a draft's `values`. */
export function restoreDraftValues(values: DraftPayload['values'] | unknown): SheetFormValues {
  const blank = emptySheetForm();
  if (!isDict(values)) return blank;
  const w = isDict(values.winding) ? values.winding : {};
  const coils =
    Array.isArray(w.coils) && w.coils.length > 0
      ? w.coils.slice(0, 12).map((c) => pickStrings({ span: '', turns: '' }, c))
      : blank.winding.coils;
  const wires =
    Array.isArray(values.wires) && values.wires.length > 0 ? values.wires.slice(0, 4).map((x) => pickStrings(blankWire(), x)) : blank.wires;
  const r = isDict(values.resistance) ? values.resistance : {};
  const readings = Array.isArray(r.readings) ? r.readings : [];
  const reading = (i: number): string => (typeof readings[i] === 'string' ? (readings[i] as string) : '');
  return {
    core: pickStrings(blank.core, values.core),
    winding: { ...pickStrings(blank.winding, w), coils },
    wires,
    insulation: pickStrings(blank.insulation, values.insulation),
    supply: pickStrings(blank.supply, values.supply),
    resistance: { ...pickStrings(blank.resistance, r), readings: [reading(0), reading(1), reading(2)] },
    notes: typeof values.notes === 'string' ? values.notes : '',
  };
}
