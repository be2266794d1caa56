'use client';

/**
 * The job's version moves on with every save and status move (optimistic locking). The page's forms are
 * separate components, so a move made here tells the details form which version it moved the job from and
 * to: the form adopts the new version only when it was based on the old one, so your own move never makes
 * your next details save look like someone else's edit, while another person's save still does.
 */
const EVENT = 'coilwright:job-version';

export interface JobVersionChange {
  jobId: string;
  from: number;
  to: number;
}

export function announceJobVersion(change: JobVersionChange): void {
  window.dispatchEvent(new CustomEvent<JobVersionChange>(EVENT, { detail: change }));
}

export function onJobVersion(listener: (change: JobVersionChange) => void): () => void {
  const handler = (e: Event) => listener((e as CustomEvent<JobVersionChange>).detail);
  window.addEventListener(EVENT, handler);
  return () => window.removeEventListener(EVENT, handler);
}
