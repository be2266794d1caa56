import Link from 'next/link';

export const metadata = { title: 'Not found' };

/** A job number, photo or page that does not exist (or was typed wrongly): say so and lead back. */
export default function NotFound() {
  return (
    <div className="card">
      <h1>Nothing here</h1>
      <p>There is no page at this address. Check the job number or the link; a job that was never logged has no page.</p>
      <p>
        <Link href="/jobs">Back to the job board</Link>
      </p>
    </div>
  );
}
