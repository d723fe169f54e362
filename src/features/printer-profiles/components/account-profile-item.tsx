import { useId, useState } from 'react';
import type { PrinterProfile } from '../../../../shared/print/printer-profile.ts';
import { Button } from '../../../components/button.tsx';
import { ProfileMeasurements } from './profile-measurements.tsx';

interface AccountProfileItemProps {
  profile: PrinterProfile;
  busy: boolean;
  onMakeDefault(): void;
  onDelete(): void;
}

/** One saved profile; deleting asks again in place, so one stray tap cannot lose a calibration. */
export function AccountProfileItem({ profile, busy, onMakeDefault, onDelete }: AccountProfileItemProps) {
  const nameId = useId();
  const [confirming, setConfirming] = useState(false);
  return (
    <li className="flex flex-col gap-3 rounded-md border border-rule p-4 sm:flex-row sm:items-center sm:justify-between">
      <div>
        <h3 id={nameId} className="flex flex-wrap items-center gap-2 font-medium">
          <span className="[overflow-wrap:anywhere]">{profile.name}</span>
          {profile.isDefault && <span className="rounded-full bg-ember-50 px-2 py-0.5 text-xs font-medium text-ember-700">Default</span>}
        </h3>
        <ProfileMeasurements profile={profile} />
      </div>
      {confirming ? (
        <div className="flex flex-wrap items-center gap-2" role="group" aria-labelledby={nameId}>
          <span className="text-sm">Delete this profile?</span>
          <Button variant="danger" disabled={busy} onClick={onDelete} aria-describedby={nameId}>
            Yes, delete
          </Button>
          <Button variant="secondary" disabled={busy} onClick={() => setConfirming(false)}>
            Keep it
          </Button>
        </div>
      ) : (
        <div className="flex flex-wrap gap-2">
          {!profile.isDefault && (
            <Button variant="secondary" disabled={busy} onClick={onMakeDefault} aria-describedby={nameId}>
              Make default
            </Button>
          )}
          <Button variant="danger" disabled={busy} onClick={() => setConfirming(true)} aria-describedby={nameId}>
            Delete
          </Button>
        </div>
      )}
    </li>
  );
}
