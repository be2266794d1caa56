import Link from 'next/link';

export const metadata = { title: 'Not allowed' };

export default function Denied() {
  return (
    <div className="card">
      <h1>Not allowed for your role</h1>
      <p>This page is for another role in the shop. Ask your administrator if you need it.</p>
      <p>
        <Link href="/jobs">Back to the job board</Link>
      </p>
    </div>
  );
}
