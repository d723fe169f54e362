import { roleLabels } from '../../../../shared/account/roles.ts';
import { Page } from '../../../components/page.tsx';
import { useAccount } from '../api/get-account.ts';
import { ChangePasswordForm } from './change-password-form.tsx';
import { UnitsPreference } from './units-preference.tsx';
import { PrintPreferences } from './print-preferences.tsx';
import { Link } from 'react-router';

export function AccountPage() {
  const { data: account } = useAccount();
  if (!account) return null;
  return (
    <Page title="Your account" width="wide">
      <div className="grid gap-6 md:grid-cols-2">
        <section aria-labelledby="profile-heading" className="rounded-lg border border-rule bg-white p-5">
          <h2 id="profile-heading" className="text-lg font-semibold">
            Profile
          </h2>
          <dl className="mt-3 grid grid-cols-[auto_1fr] gap-x-4 gap-y-2 text-sm">
            <dt className="text-ink-soft">Name</dt>
            <dd>{account.name}</dd>
            <dt className="text-ink-soft">E-mail</dt>
            <dd>
              <span className="[overflow-wrap:anywhere]">{account.email}</span> {account.emailVerified && <span className="whitespace-nowrap text-ok">(confirmed)</span>}
            </dd>
            <dt className="text-ink-soft">Role</dt>
            <dd>{roleLabels[account.role]}</dd>
          </dl>
        </section>
        <UnitsPreference current={account.units} account={account} />
        <PrintPreferences account={account} />
        <section aria-labelledby="printer-heading" className="rounded-lg border border-rule bg-white p-5">
          <h2 id="printer-heading" className="text-lg font-semibold">
            Printer profiles
          </h2>
          <p className="mt-2 text-sm">
            Print the calibration sheet, measure it and keep a profile so kits print true to size.{' '}
            <Link to="/printer" className="text-ember-700 underline">
              Calibrate a printer
            </Link>
          </p>
        </section>
        <ChangePasswordForm />
      </div>
    </Page>
  );
}
