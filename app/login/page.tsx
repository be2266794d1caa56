import { redirect } from 'next/navigation';
import { currentUser } from '@/lib/auth/guard';
import { SignInForm } from './sign-in-form';

export const metadata = { title: 'Sign in' };

export default async function LoginPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  if (await currentUser()) redirect('/jobs');
  const next = (await searchParams).next;
  return (
    <div className="card" style={{ maxWidth: 420, margin: '3rem auto' }}>
      <h1>Sign in to Coilwright</h1>
      <SignInForm next={typeof next === 'string' ? next : undefined} />
    </div>
  );
}
