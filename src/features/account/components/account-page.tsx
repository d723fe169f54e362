import { Link, useSearchParams } from 'react-router';
import { Notice } from '../../../components/notice.tsx';
import { Page } from '../../../components/page.tsx';
import { useAccount } from '../api/get-account.ts';
import { ChangePasswordForm } from './change-password-form.tsx';
import { DeleteAccount } from './delete-account.tsx';
import { LibraryArchive } from './library-archive.tsx';
import { PrintPreferences } from './print-preferences.tsx';
import { ProfileForm } from './profile-form.tsx';
import { UnitsPreference } from './units-preference.tsx';

/** What the link of an e-mail change says when it lands here (?email=...). */
const emailNotices: Record<string, { tone: 'success' | 'error'; text: string }> = {
  changed: { tone: 'success', text: 'Your new e-mail address is confirmed: sign in with it from now on.' },
  taken: { tone: 'error', text: 'That address now belongs to another account, so your e-mail address was not changed.' },
};

export function AccountPage() {
  const { data: account } = useAccount();
  const [search] = useSearchParams();
  const notice = emailNotices[search.get('email') ?? ''];
  if (!account) return null;
  return (
    <Page title="Your account" width="wide">
      {notice && (
        <div className="mb-4">
          <Notice tone={notice.tone}>{notice.text}</Notice>
        </div>
      )}
      <div className="grid gap-6 md:grid-cols-2">
        <ProfileForm account={account} />
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
        <LibraryArchive />
        <DeleteAccount />
      </div>
    </Page>
  );
}
