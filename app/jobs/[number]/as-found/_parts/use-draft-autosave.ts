'use client';

/**
 * Saves the raw form as a server-side draft a few seconds after the winder stops typing, retries when the
 * connection drops, and saves at once when the tab is hidden or closed, so nothing typed is lost.
 */
import { useCallback, useEffect, useRef, useState } from 'react';
import { saveSheetDraft } from '@/lib/as-found/as-found-actions';
import type { DraftPayload } from '@/lib/as-found/draft-schema';
import { fmt } from '@/lib/presentation/format';

/** Quiet time after the last change before the draft is sent. */
export const DRAFT_DELAY_MS = 2500;
const RETRY_MS = 10_000;

export type DraftState =
  | { kind: 'idle' }
  | { kind: 'pending' }
  | { kind: 'saving' }
  | { kind: 'saved'; at: Date }
  | { kind: 'failed'; message: string }
  | { kind: 'cleared'; text: string };

const hhmm = (d: Date): string => fmt.time(d);

export function draftStatusText(s: DraftState): string {
  switch (s.kind) {
    case 'idle': return '';
    case 'pending': return 'Unsaved changes: keeping a draft…';
    case 'saving': return 'Saving draft…';
    case 'saved': return `Draft saved ${hhmm(s.at)}`;
    case 'failed': return `Draft not saved (${s.message}); trying again shortly. Keep this tab open.`;
    case 'cleared': return s.text;
  }
}

export function useDraftAutosave(jobId: string, enabled: boolean, snapshot: () => DraftPayload) {
  const [state, setState] = useState<DraftState>({ kind: 'idle' });
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const dirty = useRef(false);
  const inFlight = useRef(false);
  const snap = useRef(snapshot);
  snap.current = snapshot;

  const sendRef = useRef<() => Promise<void>>(async () => {});
  const schedule = useCallback((ms: number) => {
    if (timer.current) clearTimeout(timer.current);
    timer.current = setTimeout(() => {
      timer.current = null;
      void sendRef.current();
    }, ms);
  }, []);

  const send = useCallback(async () => {
    if (!enabled || !dirty.current || inFlight.current) return;
    inFlight.current = true;
    dirty.current = false;
    setState({ kind: 'saving' });
    try {
      const r = await saveSheetDraft({ jobId, draft: snap.current() });
      // Changes typed while this draft was in flight are not in it: do not claim they are saved.
      if (r.ok) setState(dirty.current ? { kind: 'pending' } : { kind: 'saved', at: new Date(r.data.savedAt) });
      else {
        setState({ kind: 'failed', message: r.message });
        if (r.code !== 'frozen' && r.code !== 'forbidden') {
          dirty.current = true;
          schedule(RETRY_MS);
        }
      }
    } catch {
      dirty.current = true;
      setState({ kind: 'failed', message: 'no connection to the server' });
      schedule(RETRY_MS);
    } finally {
      inFlight.current = false;
      // Changes made while this draft was in flight get their own save.
      if (dirty.current && !timer.current) schedule(DRAFT_DELAY_MS);
    }
  }, [enabled, jobId, schedule]);
  sendRef.current = send;

  /** Call after every change to the form. */
  const changed = useCallback(() => {
    if (!enabled) return;
    dirty.current = true;
    setState((s) => (s.kind === 'failed' ? s : { kind: 'pending' }));
    schedule(DRAFT_DELAY_MS);
  }, [enabled, schedule]);

  /** After a full save: the server cleared the draft; stop any pending draft. */
  const clear = useCallback((text: string) => {
    if (timer.current) clearTimeout(timer.current);
    timer.current = null;
    dirty.current = false;
    setState({ kind: 'cleared', text });
  }, []);

  useEffect(() => {
    const flush = () => {
      if (document.visibilityState === 'hidden' && dirty.current) {
        if (timer.current) clearTimeout(timer.current);
        timer.current = null;
        void send();
      }
    };
    const warn = (e: BeforeUnloadEvent) => {
      if (dirty.current || inFlight.current) {
        void send();
        e.preventDefault();
      }
    };
    document.addEventListener('visibilitychange', flush);
    window.addEventListener('beforeunload', warn);
    return () => {
      document.removeEventListener('visibilitychange', flush);
      window.removeEventListener('beforeunload', warn);
      if (timer.current) clearTimeout(timer.current);
    };
  }, [send]);

  return { state, changed, clear, hasUnsaved: () => dirty.current || inFlight.current };
}
