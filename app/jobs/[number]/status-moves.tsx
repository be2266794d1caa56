'use client';

import { useState, useTransition } from 'react';
import { useRouter } from 'next/navigation';
import { moveStatus } from '@/lib/jobs/job-actions';
import type { JobStatus } from '@/lib/db/generated/enums';
import { FormStatus } from '@/app/_components/form-status';
import { callAction } from '@/lib/errors/call-action';

/** Buttons for the status moves this user may make from the job's current status (and only those). */
export function StatusMoves({ jobId, version, moves }: { jobId: string; version: number; moves: { to: JobStatus; label: string }[] }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [note, setNote] = useState('');
  const [summary, setSummary] = useState<{ tone: 'ok' | 'bad'; text: string } | null>(null);
  if (moves.length === 0) return <p className="muted">No further moves: this job is closed.</p>;
  const move = (to: JobStatus) =>
    startTransition(async () => {
      const result = await callAction(() => moveStatus({ jobId, version, to, note }));
      setSummary(result.ok ? { tone: 'ok', text: result.message ?? 'Moved.' } : { tone: 'bad', text: result.message });
      if (result.ok) setNote('');
      // Refresh only when the job changed (or someone else changed it): during an outage a refresh would
      // render the error page over the message and the note.
      if (result.ok || result.code === 'stale') router.refresh();
    });
  return (
    <div className="no-print">
      <FormStatus message={summary?.text} tone={summary?.tone ?? 'ok'} />
      <label htmlFor="move-note">Note for the timeline <span className="unit">(optional)</span></label>
      <input id="move-note" value={note} onChange={(e) => setNote(e.target.value)} maxLength={500} />
      <div className="row" style={{ marginTop: '0.5rem' }}>
        {moves.map((m) => (
          <button key={m.to} type="button" className="btn secondary" disabled={pending} onClick={() => move(m.to)}>
            {m.label}
          </button>
        ))}
      </div>
    </div>
  );
}
