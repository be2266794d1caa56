import Link from 'next/link';
import { PERMISSION_WORDS } from '@/lib/auth/permissions';

export const metadata = { title: 'Not allowed' };

const KNOWN = new Set<string>(Object.values(PERMISSION_WORDS));

/** The refusal page: what was refused, in words (only the app's own phrases are echoed back). */
export default async function Denied({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const to = (await searchParams).to;
  const what = typeof to === 'string' && KNOWN.has(to) ? to : null;
  return (
    <div className="card">
      <h1>Not allowed for your role</h1>
      <p>
        {what ? `Your role does not allow you to ${what}.` : 'This page is for another role in the shop.'} Ask your administrator if you
        need it.
      </p>
      <p>
        <Link href="/jobs">Back to the job board</Link>
      </p>
    </div>
  );
}
