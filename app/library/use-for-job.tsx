'use client';

import { useState, useTransition } from 'react';
import { useRouter } from 'next/navigation';
import { copyLibrarySheetToJob } from '@/lib/as-found/as-found-actions';
import { jobRoutes } from '@/lib/routes';

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
        aria-label={`Use job ${from}'s sheet for job ${jobNumber}`}
        onClick={() =>
          start(async () => {
            const r = await copyLibrarySheetToJob({ jobNumber, sheetId });
            if (r.ok) router.push(jobRoutes(jobNumber).asFound);
            else setError(r.message);
          })
        }
      >
        {pending ? 'Copying…' : `Use for job ${jobNumber}`}
      </button>
      {error && <span role="alert" className="field-error">{error}</span>}
    </>
  );
}
