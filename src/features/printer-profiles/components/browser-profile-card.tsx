import { SignInLink } from '../../../components/sign-in-link.tsx';
import { Button } from '../../../components/button.tsx';
import { forgetBrowserProfile, useBrowserProfile } from '../browser-profile.ts';
import { ProfileMeasurements } from './profile-measurements.tsx';

/** Step 3 for a visitor: the one profile kept in this browser. */
export function BrowserProfileCard() {
  const profile = useBrowserProfile();
  if (!profile) return <p className="text-sm text-ink-soft">Nothing is saved in this browser yet.</p>;
  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-col gap-3 rounded-md border border-rule p-4 sm:flex-row sm:items-center sm:justify-between">
        <div>
          <h3 className="flex flex-wrap items-center gap-2 font-medium">
            <span className="[overflow-wrap:anywhere]">{profile.name}</span>
            <span className="rounded-full bg-paper px-2 py-0.5 text-xs font-medium text-ink-soft">In this browser</span>
          </h3>
          <ProfileMeasurements profile={profile} />
        </div>
        <Button variant="secondary" onClick={forgetBrowserProfile}>
          Forget
        </Button>
      </div>
      <p className="text-sm text-ink-soft">
        Only this browser knows it; clearing site data loses it.{' '}
        <SignInLink className="text-ember-700 underline">Sign in</SignInLink>{' '}
        and Canwright offers to keep it with your account.
      </p>
    </div>
  );
}
