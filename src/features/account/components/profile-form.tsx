import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import type { Account } from '../../../../shared/account/account.ts';
import { roleLabels } from '../../../../shared/account/roles.ts';
import { Button } from '../../../components/button.tsx';
import { Notice } from '../../../components/notice.tsx';
import { TextField } from '../../../components/text-field.tsx';
import { changeNameFormSchema } from '../../auth/form-schemas.ts';
import { useChangeName } from '../api/change-name.ts';
import { ChangeEmailForm } from './change-email-form.tsx';

type NameForm = z.infer<typeof changeNameFormSchema>;

/** The name others see (changed here at once) and the e-mail address (changed once the new one is confirmed). */
export function ProfileForm({ account }: { account: Account }) {
  const change = useChangeName();
  const { register, handleSubmit, formState } = useForm<NameForm>({ resolver: zodResolver(changeNameFormSchema), values: { name: account.name } });
  return (
    <section aria-labelledby="profile-heading" className="rounded-lg border border-rule bg-white p-5">
      <h2 id="profile-heading" className="text-lg font-semibold">
        Profile
      </h2>
      <p className="mt-2 text-sm text-ink-soft">Role: {roleLabels[account.role]}</p>
      <form noValidate onSubmit={handleSubmit((form) => change.mutate(form))} className="mt-3 flex flex-col gap-3">
        <TextField label="Name" autoComplete="name" registration={register('name')} error={formState.errors.name} hint="The name others see, e.g. on a workshop's list." />
        <div className="flex flex-col gap-2 sm:flex-row sm:items-center">
          <Button type="submit" variant="secondary" disabled={change.isPending}>
            Save name
          </Button>
          <div aria-live="polite">{change.isSuccess && <p className="text-sm text-ok">Name saved.</p>}</div>
        </div>
        {change.isError && <Notice tone="error">{change.error.message}</Notice>}
      </form>
      <ChangeEmailForm account={account} />
    </section>
  );
}
