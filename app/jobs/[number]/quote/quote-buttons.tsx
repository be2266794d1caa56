'use client';

import { useState, useTransition } from 'react';
import { useRouter } from 'next/navigation';
import { startEstimate } from '@/lib/quotes/quote-actions';
import { FormStatus } from '@/app/_components/form-status';

/** Opens the job's draft estimate: the first one, or a new revision copied from the latest quote. */
export function StartEstimateButton({ jobId, label }: { jobId: string; label: string }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [error, setError] = useState<string | null>(null);
  return (
    <div>
      <FormStatus message={error} tone="bad" />
      <button
        type="button"
        className="btn"
        disabled={pending}
        onClick={() =>
          startTransition(async () => {
            const r = await startEstimate({ jobId });
            if (r.ok) router.refresh();
            else setError(r.message);
          })
        }
      >
        {pending ? 'Opening…' : label}
      </button>
    </div>
  );
}
