'use client';

/**
 * The as-found data sheet screen: the form (react-hook-form, validated by the sheet schema on both sides),
 * the live analysis beside it, the slot diagram and MMF pictures below, drafts kept on the server as the
 * winder types, unit toggle, JSON import, and saving under optimistic locking.
 */
import { useCallback, useEffect, useMemo, useRef, useState, useTransition, type KeyboardEvent as ReactKeyboardEvent } from 'react';
import { useRouter } from 'next/navigation';
import { FormProvider, useForm } from 'react-hook-form';
import { FormStatus } from '@/app/_components/form-status';
import { fmt } from '@/lib/presentation/format';
import { applyFieldErrors } from '@/lib/errors/form-errors';
import type { CoilSide } from '@/lib/engine/winding-layout';
import type { WindingSheet } from '@/lib/as-found/winding-sheet-schema';
import { chooseLengthUnit, discardSheetDraft, saveAsFoundSheet } from '@/lib/as-found/as-found-actions';
import type { LengthUnit, TypedLength } from '@/lib/as-found/length-entry';
import { liveAnalysis, type LiveAnalysis } from '@/lib/as-found/live-analysis';
import { switchFormLengths, type SheetFormValues } from '@/lib/as-found/as-found-form';
import { AnalysisPanel } from './analysis-panel';
import { FindingsStrip } from './findings-strip';
import { ImportSheet } from './import-sheet';
import { Pictures } from './pictures';
import {
  CoreSection,
  InsulationSection,
  NotesSection,
  ResistanceSection,
  SupplySection,
  WiresSection,
  WindingSection,
} from './sheet-sections';
import { serverErrorsToForm, sheetResolver } from './sheet-resolver';
import { ReadOnlyFields } from './sheet-fields';
import { draftStatusText, useDraftAutosave } from './use-draft-autosave';
import { jobRoutes } from '@/lib/routes';
import { callAction } from '@/lib/errors/call-action';

export interface SheetEditorProps {
  jobId: string;
  jobNumber: number;
  editable: boolean;
  /** Why the form is read-only, when it is. */
  readOnlyReason: string | null;
  /** The saved revision on the server now (null: none saved). */
  savedRevision: number | null;
  initial: {
    values: SheetFormValues;
    unit: LengthUnit;
    slotTable?: CoilSide[];
    source: 'draft' | 'saved' | 'nameplate';
    draftSavedAt?: string;
    /** For a restored draft: the revision it was started from (see the draft schema). */
    baseRevision?: number | null;
    /** The stored millimetres behind lengths shown in inches (see savedLengthMemory). */
    lengthMemory?: [string, TypedLength][];
  };
}

const ANALYSIS_DELAY_MS = 250;

export function SheetEditor({ jobId, jobNumber, editable, readOnlyReason, savedRevision, initial }: SheetEditorProps) {
  const router = useRouter();
  const [unit, setUnit] = useState<LengthUnit>(initial.unit);
  const unitRef = useRef(unit);
  unitRef.current = unit;
  const [slotTable, setSlotTable] = useState<CoilSide[] | undefined>(initial.slotTable);
  const slotRef = useRef(slotTable);
  slotRef.current = slotTable;
  const [baseRevision, setBaseRevision] = useState<number | null>(
    initial.baseRevision !== undefined ? initial.baseRevision : savedRevision,
  );
  const baseRef = useRef(baseRevision);
  baseRef.current = baseRevision;
  // What was typed (or stored) behind each length field shown in the other unit: a toggle never changes it.
  const memoryRef = useRef<Map<string, TypedLength>>(new Map(initial.lengthMemory ?? []));
  const [conflict, setConflict] = useState(false);
  const [summary, setSummary] = useState<{ tone: 'ok' | 'bad' | 'warn'; text: string } | null>(
    initial.source === 'draft'
      ? {
          tone: 'warn',
          text: `Restored your unsaved draft from ${fmt.dateTime(new Date(initial.draftSavedAt ?? Date.now()))}. Save the sheet to keep it, or discard the draft.`,
        }
      : null,
  );
  const [hasDraft, setHasDraft] = useState(initial.source === 'draft');
  const [pending, startTransition] = useTransition();

  const resolver = useMemo(
    () =>
      sheetResolver(
        () => unitRef.current,
        () => slotRef.current,
        () => memoryRef.current,
      ),
    [],
  );
  const form = useForm<SheetFormValues, unknown, WindingSheet>({ resolver, defaultValues: initial.values, mode: 'onSubmit' });
  const { handleSubmit, setError, watch, getValues, setValue, reset } = form;

  const autosave = useDraftAutosave(jobId, editable, () => ({
    unit: unitRef.current,
    values: getValues(),
    baseRevision: baseRef.current,
    ...(slotRef.current ? { slotTable: slotRef.current } : {}),
  }));
  const [live, setLive] = useState<LiveAnalysis>(() => liveAnalysis(initial.values, initial.unit, initial.slotTable, memoryRef.current));
  const analysisTimer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const reanalyse = useCallback(() => {
    if (analysisTimer.current) clearTimeout(analysisTimer.current);
    analysisTimer.current = setTimeout(
      () => setLive(liveAnalysis(getValues(), unitRef.current, slotRef.current, memoryRef.current)),
      ANALYSIS_DELAY_MS,
    );
  }, [getValues]);

  useEffect(() => {
    const sub = watch(() => {
      autosave.changed();
      setHasDraft(true);
      reanalyse();
    });
    return () => sub.unsubscribe();
  }, [watch, autosave.changed, reanalyse]);

  const switchUnit = (to: LengthUnit) => {
    if (to === unit) return;
    const switched = switchFormLengths(getValues(), unit, to, memoryRef.current);
    const converted = switched.values;
    memoryRef.current = switched.memory;
    unitRef.current = to;
    setUnit(to);
    for (const [k, v] of Object.entries(converted.core)) setValue(`core.${k as keyof SheetFormValues['core']}`, v);
    setValue('winding.meanTurnLengthMm', converted.winding.meanTurnLengthMm);
    setValue('winding.coilExtensionMm', converted.winding.coilExtensionMm);
    void chooseLengthUnit({ unit: to });
  };

  const onSave = handleSubmit(
    (sheet) =>
      startTransition(async () => {
        const r = await callAction(() => saveAsFoundSheet({ jobId, baseRevision, sheet }));
        if (r.ok) {
          setBaseRevision(r.data.revision);
          setConflict(false);
          setHasDraft(false);
          autosave.clear(`Saved as revision ${r.data.revision}; draft cleared.`);
          setSummary({ tone: 'ok', text: r.message ?? 'Saved.' });
          router.refresh();
          return;
        }
        if (r.code === 'stale') {
          setConflict(true);
          router.refresh();
        }
        applyFieldErrors(serverErrorsToForm(r.fieldErrors), setError);
        setSummary({ tone: 'bad', text: r.message });
      }),
    () =>
      setSummary({
        tone: 'bad',
        text: 'Some fields need attention. Each one is marked in the form; nothing was saved yet (your draft is kept).',
      }),
  );

  const discard = () =>
    startTransition(async () => {
      const r = await callAction(() => discardSheetDraft({ jobId }));
      if (r.ok) {
        autosave.clear('Draft discarded.');
        setHasDraft(false);
        // Reload the page so the form shows the saved sheet (or the nameplate start) again.
        window.location.reload();
      } else setSummary({ tone: 'bad', text: r.message });
    });

  const imported = (sheet: WindingSheet, values: SheetFormValues, name: string) => {
    setSlotTable(sheet.winding.slotTable);
    slotRef.current = sheet.winding.slotTable;
    reset(values, { keepDefaultValues: true });
    autosave.changed();
    reanalyse();
    setSummary({ tone: 'warn', text: `Imported ${name} into the form: check it, then save the sheet.` });
  };

  const readOnly = !editable;
  const statusText = draftStatusText(autosave.state);
  const drawer = useAnalysisDrawer();

  return (
    <FormProvider {...form}>
      <div className="sheet-toolbar no-print">
        <div role="radiogroup" aria-label="Lengths in" className="unit-toggle">
          <span className="label">Lengths in</span>
          {(['mm', 'in'] as const).map((u) => (
            <label key={u} className="inline">
              <input type="radio" name="length-unit" value={u} checked={unit === u} onChange={() => switchUnit(u)} />{' '}
              {u === 'mm' ? 'millimetres' : 'inches'}
            </label>
          ))}
        </div>
        <p className="draft-status small" role="status" aria-live="polite" data-testid="draft-status">
          {statusText}
        </p>
        <div className="row">
          <a className="btn quiet" href={jobRoutes(jobNumber).asFoundPrint}>
            Print view
          </a>
          {savedRevision !== null && (
            <a className="btn quiet" href={jobRoutes(jobNumber).asFoundExport} download>
              Export JSON
            </a>
          )}
          {editable && <ImportSheet unit={unit} onImported={imported} />}
          <LibraryLink jobNumber={jobNumber} values={getValues} unit={unit} />
        </div>
      </div>
      {readOnlyReason && <p className="notice warn">{readOnlyReason}</p>}
      <FormStatus message={summary?.text} tone={summary?.tone ?? 'ok'} />
      {conflict && (
        <div className="notice warn" data-testid="conflict">
          {savedRevision === baseRevision ? (
            <p>Loading the sheet saved by the other person…</p>
          ) : (
            <>
              <p>
                <strong>Saved by someone else</strong> (now revision {savedRevision}). Your values are still in this form.{' '}
                <a href={jobRoutes(jobNumber).asFoundPrint} target="_blank" rel="noreferrer">
                  Open the saved sheet
                </a>{' '}
                to compare.
              </p>
              <button
                type="button"
                className="btn secondary"
                onClick={() => {
                  setBaseRevision(savedRevision);
                  setConflict(false);
                  setSummary({
                    tone: 'warn',
                    text: 'Your values are still in the form. Save again to replace the other revision with them.',
                  });
                }}
              >
                Keep my values and save over revision {savedRevision}
              </button>
            </>
          )}
        </div>
      )}
      <div className="sheet-layout">
        <form onSubmit={onSave} noValidate aria-label="As-found data sheet" className="sheet-form">
          <ReadOnlyFields value={readOnly}>
            <div className="plain">
              <CoreSection unit={unit} />
              <WindingSection unit={unit} />
              <WiresSection />
              <SupplySection />
              <ResistanceSection />
              <InsulationSection />
              <NotesSection />
            </div>
          </ReadOnlyFields>
          {slotTable && (
            <p className="small muted">
              This sheet carries a slot table drawn by the winder ({slotTable.length} coil sides); the diagram and analysis use it.
            </p>
          )}
          {editable && (
            <div className="row save-row no-print">
              <button className="btn" type="submit" disabled={pending || conflict}>
                {pending ? 'Saving…' : 'Save data sheet'}
              </button>
              {hasDraft && initial.source === 'draft' && (
                <button type="button" className="btn quiet" onClick={discard} disabled={pending}>
                  Discard draft
                </button>
              )}
              <span className="small muted">{baseRevision === null ? 'Not saved yet.' : `Editing from revision ${baseRevision}.`}</span>
            </div>
          )}
          <FindingsStrip live={live} open={drawer.open} onToggle={drawer.toggle} controls="live-analysis" />
        </form>
        <aside
          id="live-analysis"
          className={`sheet-analysis${drawer.open ? ' open' : ''}`}
          aria-labelledby="live-h"
          ref={drawer.ref}
          tabIndex={0}
          onKeyDown={drawer.onKeyDown}
        >
          <div className="analysis-head">
            <h2 id="live-h">Live analysis</h2>
            <button type="button" className="btn quiet analysis-close" onClick={drawer.close}>
              Close
            </button>
          </div>
          <AnalysisPanel live={live} />
        </aside>
      </div>
      <Pictures live={live} />
    </FormProvider>
  );
}

/**
 * The analysis drawer of narrow screens: opening it moves focus into it, Escape or Close shuts it and
 * returns focus to the strip's button.
 */
function useAnalysisDrawer() {
  const [open, setOpen] = useState(false);
  const ref = useRef<HTMLElement>(null);
  const opener = useRef<HTMLElement | null>(null);
  const close = useCallback(() => {
    setOpen(false);
    opener.current?.focus();
  }, []);
  const toggle = useCallback(() => {
    if (open) return close();
    opener.current = document.activeElement instanceof HTMLElement ? document.activeElement : null;
    setOpen(true);
    requestAnimationFrame(() => ref.current?.focus());
  }, [open, close]);
  const onKeyDown = (e: ReactKeyboardEvent) => {
    if (open && e.key === 'Escape') {
      e.preventDefault();
      close();
    }
  };
  return { open, toggle, close, ref, onKeyDown };
}

function LibraryLink({ jobNumber, values, unit }: { jobNumber: number; values: () => SheetFormValues; unit: LengthUnit }) {
  const go = () => {
    const v = values();
    const q = new URLSearchParams({ forJob: String(jobNumber) });
    const put = (k: string, x: string) => x.trim() && q.set(k, x.trim());
    put('slots', v.core.slots);
    put('poles', v.supply.poles);
    put('bore', v.core.boreMm);
    put('length', v.core.coreLengthMm);
    q.set('unit', unit);
    window.location.href = `/library?${q.toString()}`;
  };
  return (
    <button type="button" className="btn quiet" onClick={go}>
      Find matching sheets
    </button>
  );
}
