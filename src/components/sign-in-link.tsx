import type { ReactNode } from 'react';
import { NavLink, useLocation, type NavLinkProps } from 'react-router';
import { nextFromHere, withNext } from '../features/auth/next-path.ts';

interface SignInLinkProps extends Omit<NavLinkProps, 'to' | 'children'> {
  children?: ReactNode;
}

/**
 * A link to the sign-in page that brings the person back here afterwards
 * (/sign-in?next=<this path and query>). On the sign-in and sign-up pages themselves it passes
 * on the `next` they were opened with. A NavLink, so a menu can style it as the current page.
 */
export function SignInLink({ children = 'Sign in', ...link }: SignInLinkProps) {
  const location = useLocation();
  return (
    <NavLink to={withNext('/sign-in', nextFromHere(location))} {...link}>
      {children}
    </NavLink>
  );
}
