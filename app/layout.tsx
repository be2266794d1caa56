import type { Metadata } from 'next';
import type { ReactNode } from 'react';
import Link from 'next/link';
import { currentUser } from '@/lib/auth/guard';
import { signOut } from '@/lib/auth/auth-actions';
import { can, ROLE_LABELS } from '@/lib/auth/permissions';
import { displaySettings } from '@/lib/presentation/format';
import { ShopFormat } from './_components/shop-format';
import './globals.css';

export const metadata: Metadata = {
  title: { default: 'Coilwright', template: '%s · Coilwright' },
  description: 'Job tracking, winding data, redesign and test records for motor repair shops.',
};

export default async function RootLayout({ children }: { children: ReactNode }) {
  const user = await currentUser();
  return (
    <html lang="en">
      <body>
        <ShopFormat settings={displaySettings()} />
        <a className="skip" href="#main">
          Skip to content
        </a>
        <header className="topbar">
          <Link href="/jobs" className="brand">
            Coil<span>wright</span>
          </Link>
          {user && (
            <nav aria-label="Main">
              <ul>
                <li>
                  <Link href="/jobs">Job board</Link>
                </li>
                {can(user.role, 'job.intake') && (
                  <li>
                    <Link href="/jobs/new">New intake</Link>
                  </li>
                )}
                <li>
                  <Link href="/library">Winding library</Link>
                </li>
                {can(user.role, 'stock.manage') && (
                  <li>
                    <Link href="/stock">Wire stock</Link>
                  </li>
                )}
                {can(user.role, 'settings.manage') && (
                  <li>
                    <Link href="/admin/users">People</Link>
                  </li>
                )}
                {can(user.role, 'settings.manage') && (
                  <li>
                    <Link href="/admin/commercial">Quoting settings</Link>
                  </li>
                )}
              </ul>
            </nav>
          )}
          {user && (
            <div className="who">
              <span>
                {user.name} <span className="role-label">({ROLE_LABELS[user.role]})</span>
              </span>
              <form action={signOut}>
                <button type="submit">Sign out</button>
              </form>
            </div>
          )}
        </header>
        <main id="main">{children}</main>
      </body>
    </html>
  );
}
