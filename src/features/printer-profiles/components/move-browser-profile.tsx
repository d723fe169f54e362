import { useState } from 'react';
import { Button } from '../../../components/button.tsx';
import { Notice } from '../../../components/notice.tsx';
import { useCreatePrinterProfile } from '../api/create-printer-profile.ts';
import { forgetBrowserProfile, useBrowserProfile } from '../browser-profile.ts';
import { ProfileMeasurements } from './profile-measurements.tsx';

/**
 * A profile measured before signing in still sits in this browser: offer to keep it with the
 * account (then it leaves the browser), or to forget it.
 */
export function MoveBrowserProfile() {
  const profile = useBrowserProfile();
  const create = useCreatePrinterProfile();
  const [problem, setProblem] = useState<string>();
  if (!profile) return null;

  async function move() {
    if (!profile) return;
    setProblem(undefined);
    try {
      await create.mutateAsync(profile);
      forgetBrowserProfile();
    } catch (error) {
      setProblem((error as Error).message);
    }
  }

  return (
    <section aria-labelledby="browser-profile-heading" className="flex flex-col gap-3 rounded-md border border-ember-600/30 bg-ember-50 p-4">
      <h3 id="browser-profile-heading" className="font-medium">
        Measured in this browser before you signed in: <span className="[overflow-wrap:anywhere]">{profile.name}</span>
      </h3>
      <ProfileMeasurements profile={profile} />
      <div className="flex flex-wrap gap-2">
        <Button disabled={create.isPending} onClick={() => void move()}>
          Keep it with my account
        </Button>
        <Button variant="secondary" disabled={create.isPending} onClick={forgetBrowserProfile}>
          Forget it
        </Button>
      </div>
      {problem && <Notice tone="error">{problem}</Notice>}
    </section>
  );
}
