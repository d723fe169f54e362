import type { ReactNode } from 'react';
import { Navigate, useLocation } from 'react-router';
import type { Role } from '../../shared/account/roles.ts';
import { Page } from '../components/page.tsx';
import { useAccount } from '../features/account/api/get-account.ts';

/**
 * Shows its children to a signed-in account (with one of `roles`, when given). This only hides
 * what the server would refuse; every API route checks again.
 */
export function RequireAccount({ roles, children }: { roles?: Role[]; children: ReactNode }) {
  const { data: account, isPending, isError } = useAccount();
  const location = useLocation();
  if (isPending) return <p className="p-8 text-ink-soft">Loading…</p>;
  if (isError) return <p className="p-8 text-danger">The server could not be reached. Try again in a moment.</p>;
  if (!account) return <Navigate to={`/sign-in?next=${encodeURIComponent(location.pathname + location.search)}`} replace />;
  if (roles && !roles.includes(account.role))
    return (
      <Page title="Not available">
        <p>This page is for {roles.join(' or ')} accounts.</p>
      </Page>
    );
  return children;
}
