import type { ReactNode } from 'react';
import { NavLink, useLocation, type NavLinkProps } from 'react-router';
import { nextFromHere, withNext } from '../features/auth/next-path.ts';

interface SignInLinkProps extends Omit<NavLinkProps, 'to' | 'children'> {
  children?: ReactNode;
  /** Sign in (the default), or create an account and come back here after confirming it. */
  page?: '/sign-in' | '/sign-up';
}

/**
 * A link to the sign-in page that brings the person back here afterwards
 * (/sign-in?next=<this path and query>). On the sign-in and sign-up pages themselves it passes
 * on the `next` they were opened with. A NavLink, so a menu can style it as the current page.
 */
export function SignInLink({ children = 'Sign in', page = '/sign-in', ...link }: SignInLinkProps) {
  const location = useLocation();
  return (
    <NavLink to={withNext(page, nextFromHere(location))} {...link}>
      {children}
    </NavLink>
  );
}
