import { CALIBRATION_X_MM } from '../../../../shared/print/draw-calibration.ts';
import { Page } from '../../../components/page.tsx';
import { useAccount } from '../../account/api/get-account.ts';
import { AccountProfileList } from './account-profile-list.tsx';
import { BrowserProfileCard } from './browser-profile-card.tsx';
import { CalibrationSheetStep } from './calibration-sheet-step.tsx';
import { MeasureForm } from './measure-form.tsx';
import { MoveBrowserProfile } from './move-browser-profile.tsx';
import { StepSection } from './step-section.tsx';

/**
 * /printer: print the calibration sheet, measure its rulers, keep the result as a printer
 * profile (with the account, or in this browser for a visitor) so templates print true to size.
 */
export function PrinterCalibrationPage() {
  const { data: account, isPending } = useAccount();
  const signedIn = isPending ? undefined : Boolean(account);
  return (
    <Page
      title="Printer calibration"
      width="wide"
      intro="Few printers print exactly true to size. Print one sheet, measure two rulers, and Canwright scales your templates to make up the difference, so holes land where they should."
    >
      <div className="flex flex-col gap-6">
        <CalibrationSheetStep />
        <StepSection
          step={2}
          title="Measure the long rulers"
          intro={`With a steel rule, measure each long ruler from its 0 mark to its end mark, to the nearest half millimetre (0.5 mm over ${CALIBRATION_X_MM} mm is about 0.3 %).`}
        >
          <MeasureForm signedIn={signedIn} />
        </StepSection>
        <StepSection
          step={3}
          title={signedIn ? 'Your printers' : 'Saved in this browser'}
          intro={signedIn ? 'Templates you print are scaled for your default printer.' : undefined}
        >
          {signedIn === undefined ? (
            <p className="text-sm text-ink-soft">Loading…</p>
          ) : signedIn ? (
            <div className="flex flex-col gap-4">
              <MoveBrowserProfile />
              <AccountProfileList />
            </div>
          ) : (
            <BrowserProfileCard />
          )}
        </StepSection>
      </div>
    </Page>
  );
}
