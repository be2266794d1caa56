'use client';

/**
 * Shown when a screen cannot be drawn (typically the database is restarting or unreachable). It says what
 * happened in shop words, offers to try again in place, and leads back to the board. Nothing the user had
 * saved is affected; unsaved typing lives in the forms, which keep it on a failed save (lib/errors/call-action.ts).
 */
import Link from 'next/link';
import { useEffect } from 'react';

export default function ScreenError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  useEffect(() => {
    console.error('[coilwright] screen failed', error.digest ?? error.message);
  }, [error]);
  return (
    <div className="card" role="alert">
      <h1>This screen could not be loaded</h1>
      <p>
        The shop system did not answer in time, or it is restarting. Your saved records are safe. Wait a moment and try again; if it keeps
        happening, tell your administrator{error.digest ? ` and quote reference ${error.digest}` : ''}.
      </p>
      <p className="row">
        <button type="button" className="btn" onClick={() => reset()}>
          Try again
        </button>
        <Link href="/jobs">Back to the job board</Link>
      </p>
    </div>
  );
}
