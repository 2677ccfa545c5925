import Link from 'next/link';
import type { SessionUser } from '@/lib/auth/session';
import { ROLE_LABELS } from '@/lib/auth/roles';
import Wordmark from './Wordmark';
import NavLinks, { type NavItem } from './NavLinks';
import SignOutButton from './SignOutButton';

/**
 * The left rail on desktop; on a phone the same parts sit in a top bar. Users appears for
 * administrators only (the API guards it as well).
 */
export default function AppRail({ user }: { user: SessionUser }) {
  const items: NavItem[] = [
    { href: '/bridges', label: 'Bridges' },
    { href: '/learn', label: 'Learn' },
  ];
  if (user.role === 'admin') items.push({ href: '/admin/users', label: 'Users' });
  if (user.role === 'admin') items.push({ href: '/admin/outbox', label: 'Outbox' });
  return (
    <header className="no-print bg-brand-800 text-white md:sticky md:top-0 md:flex md:h-screen md:w-60 md:shrink-0 md:flex-col md:overflow-y-auto">
      <div className="flex flex-wrap items-center justify-between gap-3 px-4 py-3 md:flex-1 md:flex-col md:flex-nowrap md:items-stretch md:justify-start md:gap-6 md:py-6">
        <Link href="/bridges" className="rounded-md" aria-label="Chordline, go to bridges">
          <Wordmark />
        </Link>
        <nav aria-label="Main" className="order-last w-full md:order-none md:w-auto">
          <NavLinks items={items} />
        </nav>
        <div className="flex items-center gap-3 md:mt-auto md:flex-col md:items-stretch md:border-t md:border-brand-700 md:pt-4">
          <div className="text-right text-sm leading-tight md:text-left">
            <div className="font-semibold">{user.name}</div>
            <div className="text-brand-100">{ROLE_LABELS[user.role]}</div>
          </div>
          <SignOutButton userId={user.id} />
        </div>
      </div>
    </header>
  );
}
