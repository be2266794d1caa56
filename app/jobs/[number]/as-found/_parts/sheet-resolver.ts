/**
 * react-hook-form resolver for the sheet form: converts the typed form to the schema's input at the edge
 * (lengths to mm, text to numbers) and validates with windingSheetSchema, the schema the server uses too.
 * Schema paths are mapped onto the form's fields (coil rows) so every message shows beside its field.
 */
import { toNestErrors } from '@hookform/resolvers';
import type { FieldError, Resolver } from 'react-hook-form';
import type { CoilSide } from '@/lib/engine/winding-layout';
import { windingSheetSchema, type WindingSheet } from '@/lib/as-found/winding-sheet-schema';
import type { LengthUnit } from '@/lib/as-found/length-entry';
import { formToSheetInput, sheetPathToFormPath, type LengthMemory, type SheetFormValues } from '@/lib/as-found/as-found-form';

export function sheetResolver(
  unit: () => LengthUnit,
  slotTable: () => CoilSide[] | undefined,
  memory: () => LengthMemory,
): Resolver<SheetFormValues, unknown, WindingSheet> {
  return async (values, _context, options) => {
    const r = windingSheetSchema.safeParse(formToSheetInput(values, unit(), slotTable(), memory()));
    if (r.success) return { values: r.data, errors: {} };
    const flat: Record<string, FieldError> = {};
    for (const issue of r.error.issues) {
      const key = sheetPathToFormPath(issue.path.map(String).join('.'));
      flat[key] ??= { type: issue.code, message: issue.message };
    }
    return { values: {}, errors: toNestErrors(flat, options) };
  };
}

/** Server field errors (paths like `sheet.core.boreMm`) as form paths. */
export function serverErrorsToForm(fieldErrors: Record<string, string[]> | undefined): Record<string, string[]> {
  const out: Record<string, string[]> = {};
  for (const [k, v] of Object.entries(fieldErrors ?? {})) (out[sheetPathToFormPath(k)] ??= []).push(...v);
  return out;
}
