import { createBrowserRouter } from 'react-router';
import { AccountPage } from '../features/account/components/account-page.tsx';
import { AdminUsersPage } from '../features/admin/components/admin-users-page.tsx';
import { ForgotPasswordPage } from '../features/auth/components/forgot-password-page.tsx';
import { ResetPasswordPage } from '../features/auth/components/reset-password-page.tsx';
import { SignInPage } from '../features/auth/components/sign-in-page.tsx';
import { SignUpPage } from '../features/auth/components/sign-up-page.tsx';
import { VerifyPage } from '../features/auth/components/verify-page.tsx';
import { DevMailPage } from '../features/dev-mail/components/dev-mail-page.tsx';
import { HomePage } from '../features/home/home-page.tsx';
import { Layout } from './layout.tsx';
import { NotFoundPage } from './not-found-page.tsx';
import { RequireAccount } from './require-account.tsx';

export const router = createBrowserRouter([
  {
    element: <Layout />,
    children: [
      { index: true, element: <HomePage /> },
      { path: 'sign-up', element: <SignUpPage /> },
      { path: 'sign-in', element: <SignInPage /> },
      { path: 'verify', element: <VerifyPage /> },
      { path: 'forgot-password', element: <ForgotPasswordPage /> },
      { path: 'reset-password', element: <ResetPasswordPage /> },
      {
        path: 'account',
        element: (
          <RequireAccount>
            <AccountPage />
          </RequireAccount>
        ),
      },
      {
        path: 'admin/users',
        element: (
          <RequireAccount roles={['admin']}>
            <AdminUsersPage />
          </RequireAccount>
        ),
      },
      { path: 'dev/mail', element: <DevMailPage /> },
      { path: '*', element: <NotFoundPage /> },
    ],
  },
]);
