'use client';

import { useState, useTransition } from 'react';
import { useRouter } from 'next/navigation';
import { chooseCandidate } from '@/lib/redesign/redesign-actions';
import { callAction } from '@/lib/errors/call-action';

/** Chooses one candidate of a draft revision; a refusal (approved, stale) is shown beside the button. */
export function ChooseButton({
  redesignId,
  version,
  candidateKey,
  rank,
}: {
  redesignId: string;
  version: number;
  candidateKey: string;
  rank: number;
}) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [error, setError] = useState<string | null>(null);
  return (
    <span className="no-print">
      <button
        type="button"
        className="btn secondary"
        disabled={pending}
        aria-label={`Choose candidate ${rank}`}
        onClick={() =>
          startTransition(async () => {
            setError(null);
            const r = await callAction(() => chooseCandidate({ redesignId, version, key: candidateKey }));
            if (r.ok) {
              router.push(`?rev=${new URLSearchParams(window.location.search).get('rev') ?? ''}#chosen`);
              router.refresh();
            } else setError(r.message);
          })
        }
      >
        {pending ? 'Choosing…' : 'Choose'}
      </button>
      {error && (
        <span role="alert" className="field-error" style={{ display: 'block' }}>
          {error}
        </span>
      )}
    </span>
  );
}
