import { useQueryClient } from '@tanstack/react-query';
import { Link, NavLink, Outlet, ScrollRestoration, useNavigate } from 'react-router';
import { SafetyNote } from '../components/safety-note.tsx';
import { SignInLink } from '../components/sign-in-link.tsx';
import { accountQueryKey, useAccount } from '../features/account/api/get-account.ts';
import { useAppInfo } from '../features/app-info/api/get-app-info.ts';
import { useDraftFollowsAccount } from '../features/designer/use-draft-follows-account.ts';

const navClass = ({ isActive }: { isActive: boolean }) =>
  `rounded-md px-3 py-2 text-sm font-medium ${isActive ? 'bg-ember-50 text-ember-700' : 'text-ink hover:bg-ember-50'}`;

export function Layout() {
  const { data: account } = useAccount();
  const { data: appInfo } = useAppInfo();
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  useDraftFollowsAccount();

  async function signOut() {
    const { authClient } = await import('../lib/auth-client.ts');
    await authClient.signOut();
    queryClient.setQueryData(accountQueryKey, null);
    queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== 'account' && query.queryKey[0] !== 'app-info' });
    await navigate('/');
  }

  return (
    <div className="flex min-h-screen flex-col">
      {/* A new page starts at its top; back and forward return to where the reader was. */}
      <ScrollRestoration />
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:rounded focus:bg-white focus:px-3 focus:py-2">
        Skip to content
      </a>
      <header className="border-b border-rule bg-white">
        <div className="mx-auto flex max-w-5xl flex-wrap items-center gap-2 px-4 py-3">
          <Link to="/" className="mr-auto flex items-center gap-2 text-lg font-semibold tracking-tight">
            <img src="/favicon.svg" alt="" className="h-7 w-7" />
            Canwright
          </Link>
          <nav aria-label="Main" className="flex flex-wrap items-center gap-1">
            <NavLink to="/design" className={navClass}>
              Design
            </NavLink>
            <NavLink to="/printer" className={navClass}>
              Printer
            </NavLink>
            {account ? (
              <>
                <NavLink to="/library" className={navClass}>
                  Library
                </NavLink>
                <NavLink to="/workshops" className={navClass}>
                  Workshops
                </NavLink>
                {account.role === 'admin' && (
                  <NavLink to="/admin/users" className={navClass}>
                    Users
                  </NavLink>
                )}
                <NavLink to="/account" className={navClass}>
                  Account
                </NavLink>
                <button type="button" onClick={() => void signOut()} className="rounded-md px-3 py-2 text-sm font-medium hover:bg-ember-50">
                  Sign out
                </button>
              </>
            ) : (
              <>
                <SignInLink className={navClass}>Sign in</SignInLink>
                <SignInLink page="/sign-up" className={navClass}>
                  Create account
                </SignInLink>
              </>
            )}
          </nav>
        </div>
      </header>
      <main id="main" className="flex-1">
        <Outlet />
      </main>
      <footer className="border-t border-rule bg-white">
        <div className="mx-auto flex max-w-5xl flex-col gap-2 px-4 py-4">
          <SafetyNote />
          <p className="text-xs text-ink-soft">
            Canwright {appInfo?.version}
            {appInfo?.devMailbox && (
              <>
                {' · '}
                <Link to="/dev/mail" className="underline">
                  Local mailbox (development)
                </Link>
              </>
            )}
          </p>
        </div>
      </footer>
    </div>
  );
}
