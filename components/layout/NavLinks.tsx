'use client';
// The main sections; the current one is marked for sight and for screen readers.
import Link from 'next/link';
import { usePathname } from 'next/navigation';
import type { Role } from './roles';

type Item = { href: string; label: string; roles: Role[] };

const items: Item[] = [
  { href: '/jobs', label: 'Jobs', roles: ['owner', 'designer', 'crew'] },
  { href: '/catalogue', label: 'Catalogue', roles: ['owner'] },
  { href: '/team', label: 'Team', roles: ['owner'] },
  { href: '/inbox', label: 'Sent mail', roles: ['owner'] },
  { href: '/settings', label: 'Settings', roles: ['owner', 'designer', 'crew'] },
];

export function NavLinks({ role }: { role: Role }) {
  const pathname = usePathname() ?? '';
  return (
    <ul className="flex items-stretch gap-1">
      {items
        .filter((item) => item.roles.includes(role))
        .map((item) => {
          const active =
            pathname === item.href ||
            pathname.startsWith(`${item.href}/`) ||
            (item.href === '/jobs' && pathname.startsWith('/designs/'));
          return (
            <li key={item.href}>
              <Link
                href={item.href}
                aria-current={active ? 'page' : undefined}
                className={`flex min-h-11 items-center rounded-lg px-3.5 text-[0.95rem] font-semibold transition-colors ${
                  active
                    ? 'bg-white/12 text-white shadow-[inset_0_-3px_0_0_#d49858]'
                    : 'text-spruce-100 hover:bg-white/8 hover:text-white'
                }`}
              >
                {item.label}
              </Link>
            </li>
          );
        })}
    </ul>
  );
}
