'use client';

/**
 * Import of a data sheet exported as JSON (format coilwright.winding-sheet, version 1). The file is checked
 * whole with parseWindingSheetJson; any problem is listed with its path and the form is left untouched
 * (never half-imported). A good file fills the form in the user's unit; the winder then saves.
 */
import { useRef, useState } from 'react';
import { parseWindingSheetJson, type SheetIssue, type WindingSheet } from '@/lib/as-found/winding-sheet-schema';
import type { LengthUnit } from '@/lib/as-found/length-entry';
import { sheetToForm, type SheetFormValues } from '@/lib/as-found/as-found-form';

/** Largest file read: a sheet with a full slot table is well under this. */
const MAX_IMPORT_BYTES = 1024 * 1024;

export function ImportSheet({
  unit,
  onImported,
}: {
  unit: LengthUnit;
  onImported: (sheet: WindingSheet, values: SheetFormValues, name: string) => void;
}) {
  const ref = useRef<HTMLInputElement>(null);
  const [issues, setIssues] = useState<{ file: string; list: SheetIssue[] } | null>(null);
  const read = async () => {
    const file = ref.current?.files?.[0];
    if (!file) return;
    const list: SheetIssue[] =
      file.size > MAX_IMPORT_BYTES
        ? [{ path: '', message: `The file is ${Math.round(file.size / 1024)} kB; a data sheet is at most ${MAX_IMPORT_BYTES / 1024} kB.` }]
        : [];
    const parsed = list.length ? null : parseWindingSheetJson(await file.text());
    if (ref.current) ref.current.value = '';
    if (!parsed || !parsed.ok) {
      setIssues({ file: file.name, list: parsed && !parsed.ok ? parsed.issues : list });
      return;
    }
    setIssues(null);
    onImported(parsed.value.sheet, sheetToForm(parsed.value.sheet, unit), file.name);
  };
  return (
    <div className="import">
      <label htmlFor="import-json" className="btn quiet">
        Import JSON…
      </label>
      <input id="import-json" ref={ref} type="file" accept="application/json,.json" className="sr-only" onChange={() => void read()} />
      {issues && (
        <div role="alert" className="notice bad small import-issues" data-testid="import-issues">
          <p>
            <strong>{issues.file} was not imported</strong> ({issues.list.length} problem{issues.list.length === 1 ? '' : 's'}); the form is
            unchanged:
          </p>
          <ul>
            {issues.list.map((i) => (
              <li key={`${i.path}:${i.message}`}>
                <code>{i.path || '(file)'}</code>: {i.message}
              </li>
            ))}
          </ul>
          <button type="button" className="btn quiet small-btn" onClick={() => setIssues(null)}>
            Dismiss
          </button>
        </div>
      )}
    </div>
  );
}
