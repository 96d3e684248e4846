// The signed-in shell's top bar: mark, sections, who is signed in (and as what), sign-out.
import Link from 'next/link';
import { Logo } from '@/components/ui/Logo';
import { NavLinks } from './NavLinks';
import { SignOutButton } from './SignOutButton';
import { roleLabels, type ShellUser } from './roles';

export function AppHeader({ user }: { user: ShellUser }) {
  return (
    <header className="sticky top-0 z-30 bg-spruce-800 text-white shadow-md">
      <div className="mx-auto flex max-w-7xl flex-wrap items-center gap-x-4 gap-y-1 px-3 py-2 sm:px-5">
        <Link
          href="/jobs"
          className="flex min-h-11 items-center rounded-lg pr-2"
          aria-label="Joistwright: jobs"
        >
          <Logo tone="light" size={32} />
        </Link>
        <nav
          aria-label="Main"
          className="order-last -mx-1 w-full overflow-x-auto md:order-none md:mx-0 md:w-auto"
        >
          <NavLinks role={user.role} />
        </nav>
        <div className="ml-auto flex min-w-0 items-center gap-2 sm:gap-3">
          <div
            data-testid="signed-in-user"
            className="flex min-w-0 flex-col items-end leading-tight"
            title={user.email}
          >
            <span className="max-w-[9rem] truncate text-sm font-semibold sm:max-w-[16rem]">
              {user.name}
            </span>
            <span className="text-xs font-medium text-larch-200">{roleLabels[user.role]}</span>
          </div>
          <SignOutButton />
        </div>
      </div>
    </header>
  );
}
