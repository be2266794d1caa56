'use client';

import { useState, useTransition } from 'react';
import { useRouter } from 'next/navigation';
import { copyLibrarySheetToJob } from '@/lib/as-found/as-found-actions';
import { jobRoutes } from '@/lib/routes';
import { callAction } from '@/lib/errors/call-action';

/** "Use for job N": copies the match into job N's sheet draft and opens the sheet. */
export function UseForJob({ jobNumber, sheetId, from }: { jobNumber: number; sheetId: string; from: number }) {
  const router = useRouter();
  const [pending, start] = useTransition();
  const [error, setError] = useState<string | null>(null);
  return (
    <>
      <button
        type="button"
        className="btn secondary small-btn"
        disabled={pending}
        onClick={() =>
          start(async () => {
            const r = await callAction(() => copyLibrarySheetToJob({ jobNumber, sheetId }));
            if (r.ok) router.push(jobRoutes(jobNumber).asFound);
            else setError(r.message);
          })
        }
      >
        {pending ? 'Copying…' : `Use for job ${jobNumber}`}
        {/* The name starts with the visible words (WCAG 2.5.3) and says which sheet. */}
        <span className="sr-only"> (job {from}’s sheet)</span>
      </button>
      {error && (
        <span role="alert" className="field-error">
          {error}
        </span>
      )}
    </>
  );
}
