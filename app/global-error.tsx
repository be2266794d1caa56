'use client';

/**
 * Last resort when even the page frame (which reads the signed-in person) fails, e.g. the database is
 * down. It replaces the root layout, so it brings its own <html> and minimal inline-free styling.
 */
export default function GlobalError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <html lang="en">
      <body style={{ fontFamily: 'system-ui, sans-serif', maxWidth: '40rem', margin: '3rem auto', padding: '0 1rem', lineHeight: 1.5 }}>
        <main role="alert">
          <h1>Coilwright is not answering right now</h1>
          <p>
            The shop system could not load this page: the database may be restarting or unreachable. Saved records are safe. Wait a moment,
            then try again{error.digest ? ` (reference ${error.digest})` : ''}.
          </p>
          <p>
            <button type="button" onClick={() => reset()}>
              Try again
            </button>{' '}
            {/* The root layout itself failed: a full page load, not the client router, is what recovers. */}
            {/* eslint-disable-next-line @next/next/no-html-link-for-pages */}
            <a href="/jobs">Back to the job board</a>
          </p>
        </main>
      </body>
    </html>
  );
}
