import { createBrowserRouter } from 'react-router';
import { HomePage } from '../features/home/home-page.tsx';
import { Layout } from './layout.tsx';
import { NotFoundPage } from './not-found-page.tsx';
import { RequireAccount } from './require-account.tsx';

/** Every page but the start page loads on demand, so the first visit downloads little. */
export const router = createBrowserRouter([
  {
    element: <Layout />,
    children: [
      { index: true, element: <HomePage /> },
      { path: 'sign-up', lazy: () => import('../features/auth/components/sign-up-page.tsx').then((m) => ({ Component: m.SignUpPage })) },
      { path: 'sign-in', lazy: () => import('../features/auth/components/sign-in-page.tsx').then((m) => ({ Component: m.SignInPage })) },
      { path: 'verify', lazy: () => import('../features/auth/components/verify-page.tsx').then((m) => ({ Component: m.VerifyPage })) },
      { path: 'forgot-password', lazy: () => import('../features/auth/components/forgot-password-page.tsx').then((m) => ({ Component: m.ForgotPasswordPage })) },
      { path: 'reset-password', lazy: () => import('../features/auth/components/reset-password-page.tsx').then((m) => ({ Component: m.ResetPasswordPage })) },
      {
        path: 'account',
        lazy: () =>
          import('../features/account/components/account-page.tsx').then(({ AccountPage }) => ({
            Component: () => (
              <RequireAccount>
                <AccountPage />
              </RequireAccount>
            ),
          })),
      },
      {
        path: 'admin/users',
        lazy: () =>
          import('../features/admin/components/admin-users-page.tsx').then(({ AdminUsersPage }) => ({
            Component: () => (
              <RequireAccount roles={['admin']}>
                <AdminUsersPage />
              </RequireAccount>
            ),
          })),
      },
      {
        path: 'library',
        lazy: () =>
          import('../features/library/components/library-page.tsx').then(({ LibraryPage }) => ({
            Component: () => (
              <RequireAccount>
                <LibraryPage />
              </RequireAccount>
            ),
          })),
      },
      {
        path: 'library/:id',
        lazy: () =>
          import('../features/library/components/design-history-page.tsx').then(({ DesignHistoryPage }) => ({
            Component: () => (
              <RequireAccount>
                <DesignHistoryPage />
              </RequireAccount>
            ),
          })),
      },
      {
        path: 'library/:id/timer',
        lazy: () =>
          import('../features/burns/components/burn-timer-page.tsx').then(({ BurnTimerPage }) => ({
            Component: () => (
              <RequireAccount>
                <BurnTimerPage />
              </RequireAccount>
            ),
          })),
      },
      {
        path: 'library/:id/burns/new',
        lazy: () =>
          import('../features/burns/components/burn-entry-page.tsx').then(({ NewBurnPage }) => ({
            Component: () => (
              <RequireAccount>
                <NewBurnPage />
              </RequireAccount>
            ),
          })),
      },
      {
        path: 'library/:id/burns/:burnId',
        lazy: () =>
          import('../features/burns/components/burn-entry-page.tsx').then(({ BurnEntryPage }) => ({
            Component: () => (
              <RequireAccount>
                <BurnEntryPage />
              </RequireAccount>
            ),
          })),
      },
      {
        path: 'workshops',
        lazy: () =>
          import('../features/workshops/components/workshops-page.tsx').then(({ WorkshopsPage }) => ({
            Component: () => (
              <RequireAccount>
                <WorkshopsPage />
              </RequireAccount>
            ),
          })),
      },
      { path: 'workshops/join', lazy: () => import('../features/workshops/components/join-page.tsx').then((m) => ({ Component: m.JoinPage })) },
      {
        path: 'workshops/:id',
        lazy: () =>
          import('../features/workshops/components/workshop-page.tsx').then(({ WorkshopPage }) => ({
            Component: () => (
              <RequireAccount>
                <WorkshopPage />
              </RequireAccount>
            ),
          })),
      },
      {
        path: 'workshops/:id/burns/:burnId',
        lazy: () =>
          import('../features/burns/components/burn-entry-page.tsx').then(({ BurnEntryPage }) => ({
            Component: () => (
              <RequireAccount>
                <BurnEntryPage inWorkshop />
              </RequireAccount>
            ),
          })),
      },
      { path: 'shared/:token', lazy: () => import('../features/shared-design/components/shared-design-page.tsx').then((m) => ({ Component: m.SharedDesignPage })) },
      { path: 'design/print', lazy: () => import('../features/print/components/print-page.tsx').then((m) => ({ Component: m.PrintPage })) },
      { path: 'design', lazy: () => import('../features/designer/components/designer-page.tsx').then((m) => ({ Component: m.DesignerPage })) },
      { path: 'printer', lazy: () => import('../features/printer-profiles/components/printer-calibration-page.tsx').then((m) => ({ Component: m.PrinterCalibrationPage })) },
      { path: 'preview-demo', lazy: () => import('../features/preview/components/preview-demo-page.tsx').then((m) => ({ Component: m.PreviewDemoPage })) },
      { path: 'dev/mail', lazy: () => import('../features/dev-mail/components/dev-mail-page.tsx').then((m) => ({ Component: m.DevMailPage })) },
      { path: '*', element: <NotFoundPage /> },
    ],
  },
]);
