'use client';

/**
 * Saves the raw form as a server-side draft a few seconds after the winder stops typing, retries when the
 * connection drops, and saves at once when the tab is hidden or closed, so nothing typed is lost.
 */
import { useCallback, useEffect, useLayoutEffect, useRef, useState } from 'react';
import { useRouter } from 'next/navigation';
import { saveSheetDraft } from '@/lib/as-found/as-found-actions';
import type { DraftPayload } from '@/lib/as-found/draft-schema';
import { callAction } from '@/lib/errors/call-action';
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
    case 'idle':
      return '';
    case 'pending':
      return 'Unsaved changes: keeping a draft…';
    case 'saving':
      return 'Saving draft…';
    case 'saved':
      return `Draft saved ${hhmm(s.at)}`;
    case 'failed':
      return `Draft not saved (${s.message}); trying again shortly. Keep this tab open.`;
    case 'cleared':
      return s.text;
  }
}

export function useDraftAutosave(jobId: string, enabled: boolean, snapshot: () => DraftPayload) {
  const router = useRouter();
  const [state, setState] = useState<DraftState>({ kind: 'idle' });
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const dirty = useRef(false);
  const inFlight = useRef(false);
  const snap = useRef(snapshot);
  // The latest snapshot function, kept current after each render (never written during render).
  useLayoutEffect(() => {
    snap.current = snapshot;
  });

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
      const r = await callAction(() => saveSheetDraft({ jobId, draft: snap.current() }));
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
  useLayoutEffect(() => {
    sendRef.current = send;
  }, [send]);

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
    // The page is going away (tab closed, reload, another address): send what is pending now.
    const onPageHide = () => {
      if (dirty.current) {
        if (timer.current) clearTimeout(timer.current);
        timer.current = null;
        void send();
      }
    };
    // A link inside the app leaves without unloading the page: hold the navigation until the draft is sent,
    // so leaving within the autosave delay loses nothing.
    const onClick = (e: MouseEvent) => {
      if (!dirty.current && !inFlight.current) return;
      const a = (e.target as Element | null)?.closest?.('a[href]');
      if (
        !(a instanceof HTMLAnchorElement) ||
        a.target ||
        a.hasAttribute('download') ||
        e.defaultPrevented ||
        e.button !== 0 ||
        e.metaKey ||
        e.ctrlKey ||
        e.shiftKey
      )
        return;
      const url = new URL(a.href, window.location.href);
      if (url.origin !== window.location.origin || url.pathname === window.location.pathname) return;
      e.preventDefault();
      e.stopPropagation();
      if (timer.current) clearTimeout(timer.current);
      timer.current = null;
      void (async () => {
        for (let i = 0; i < 50 && inFlight.current; i++) await new Promise((r) => setTimeout(r, 100));
        await send();
        router.push(url.pathname + url.search + url.hash);
      })();
    };
    document.addEventListener('visibilitychange', flush);
    window.addEventListener('beforeunload', warn);
    window.addEventListener('pagehide', onPageHide);
    document.addEventListener('click', onClick, true);
    return () => {
      document.removeEventListener('visibilitychange', flush);
      window.removeEventListener('beforeunload', warn);
      window.removeEventListener('pagehide', onPageHide);
      document.removeEventListener('click', onClick, true);
      if (timer.current) clearTimeout(timer.current);
      // Unmounted by a navigation the click handler did not see (back button): send what is pending.
      if (dirty.current) void send();
    };
  }, [send, router]);

  return { state, changed, clear, hasUnsaved: () => dirty.current || inFlight.current };
}
