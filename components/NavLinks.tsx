'use client';

import Link from 'next/link';
import { usePathname } from 'next/navigation';

export type NavItem = { href: string; label: string };

/** The rail's links; the current section is marked for sight and for screen readers. */
export default function NavLinks({ items }: { items: NavItem[] }) {
  const pathname = usePathname();
  return (
    <ul className="flex gap-1 md:flex-col">
      {items.map((item) => {
        const current = pathname === item.href || pathname.startsWith(`${item.href}/`);
        return (
          <li key={item.href}>
            <Link
              href={item.href}
              aria-current={current ? 'page' : undefined}
              className={`block rounded-md px-3 py-2 text-sm font-semibold transition-colors ${current ? 'bg-brand-700 text-white' : 'text-brand-100 hover:bg-brand-700/60 hover:text-white'}`}
            >
              {item.label}
            </Link>
          </li>
        );
      })}
    </ul>
  );
}
