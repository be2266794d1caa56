'use client';

import { useState, useTransition } from 'react';
import { useRouter } from 'next/navigation';
import { moveStatus, recordGateDecisionAction } from '@/lib/jobs/job-actions';
import type { JobStatus } from '@/lib/db/generated/enums';
import type { GateDecisionKind } from '@/lib/jobs/shop-gates';
import { FormStatus } from '@/app/_components/form-status';
import { callAction } from '@/lib/errors/call-action';
import { announceJobVersion } from './job-version';

export interface MoveOption {
  to: JobStatus;
  label: string;
  /** Why the records do not allow this move yet (the server refuses it with the same words). */
  blocked?: string;
  /** The engineer's decision that would release it. */
  release?: GateDecisionKind;
}

const RELEASE_TEXT: Record<GateDecisionKind, { legend: string; button: string }> = {
  'ready-override': { legend: 'Engineer’s override: release to Ready without a passing final test', button: 'Record the override' },
  'keep-original-winding': { legend: 'Engineer’s decision: keep the original winding', button: 'Record the decision' },
};

/** Buttons for the status moves this user may make, each gate explained beside its button. */
export function StatusMoves({
  jobId,
  version,
  moves,
  mayRelease,
}: {
  jobId: string;
  version: number;
  moves: MoveOption[];
  mayRelease: boolean;
}) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [note, setNote] = useState('');
  const [reason, setReason] = useState('');
  const [summary, setSummary] = useState<{ tone: 'ok' | 'bad'; text: string } | null>(null);
  if (moves.length === 0) return <p className="muted">No further moves: this job is closed.</p>;
  const move = (to: JobStatus) =>
    startTransition(async () => {
      const result = await callAction(() => moveStatus({ jobId, version, to, note }));
      setSummary(result.ok ? { tone: 'ok', text: result.message ?? 'Moved.' } : { tone: 'bad', text: result.message });
      if (result.ok) {
        setNote('');
        announceJobVersion({ jobId, from: version, to: result.data.version });
      }
      // Refresh only when the job changed (or someone else changed it): during an outage a refresh would
      // render the error page over the message and the note.
      if (result.ok || result.code === 'stale') router.refresh();
    });
  const release = (decision: GateDecisionKind) =>
    startTransition(async () => {
      const result = await recordGateDecisionAction({ jobId, decision, reason });
      setSummary(
        result.ok
          ? { tone: 'ok', text: result.message ?? 'Recorded.' }
          : { tone: 'bad', text: result.fieldErrors?.reason?.[0] ?? result.message },
      );
      if (result.ok) setReason('');
      router.refresh();
    });
  const releasable = moves.filter((m) => m.blocked && m.release);
  return (
    <div className="no-print">
      <FormStatus message={summary?.text} tone={summary?.tone ?? 'ok'} />
      <label htmlFor="move-note">
        Note for the timeline <span className="unit">(optional)</span>
      </label>
      <input id="move-note" value={note} onChange={(e) => setNote(e.target.value)} maxLength={500} />
      <div className="row" style={{ marginTop: '0.5rem' }}>
        {moves.map((m) => (
          <button
            key={m.to}
            type="button"
            className="btn secondary"
            disabled={pending}
            onClick={() => move(m.to)}
            aria-describedby={m.blocked ? `gate-${m.to}` : undefined}
          >
            {m.label}
          </button>
        ))}
      </div>
      {moves
        .filter((m) => m.blocked)
        .map((m) => (
          <p key={m.to} id={`gate-${m.to}`} className="notice warn" data-testid={`gate-${m.to}`}>
            ⚠ {m.blocked}
          </p>
        ))}
      {mayRelease &&
        releasable.map((m) => (
          <fieldset key={m.to} className="card">
            <legend>{RELEASE_TEXT[m.release!].legend}</legend>
            <label htmlFor={`release-${m.to}`}>
              Reason (printed on the job sheet and the timeline) <span aria-hidden="true">*</span>
            </label>
            <textarea
              id={`release-${m.to}`}
              value={reason}
              onChange={(e) => setReason(e.target.value)}
              maxLength={1000}
              required
              aria-required="true"
            />
            <button type="button" className="btn" disabled={pending} onClick={() => release(m.release!)}>
              {RELEASE_TEXT[m.release!].button}
            </button>
          </fieldset>
        ))}
    </div>
  );
}
