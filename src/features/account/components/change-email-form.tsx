import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import type { Account } from '../../../../shared/account/account.ts';
import { Button } from '../../../components/button.tsx';
import { Notice } from '../../../components/notice.tsx';
import { TextField } from '../../../components/text-field.tsx';
import { changeEmailFormSchema } from '../../auth/form-schemas.ts';
import { useChangeEmail } from '../api/change-email.ts';

type EmailForm = z.infer<typeof changeEmailFormSchema>;

/** A new address takes effect once the link mailed to it is opened; until then the old one stands. */
export function ChangeEmailForm({ account }: { account: Account }) {
  const change = useChangeEmail();
  const { register, handleSubmit, formState, reset } = useForm<EmailForm>({ resolver: zodResolver(changeEmailFormSchema) });
  const sentTo = change.isSuccess ? change.variables : undefined;

  async function onSubmit(form: EmailForm) {
    if (form.email.trim().toLowerCase() === account.email.toLowerCase()) return;
    await change.mutateAsync(form.email.trim()).then(() => reset(), () => undefined);
  }

  return (
    <div className="mt-5 border-t border-rule pt-4">
      <p className="text-sm">
        E-mail: <span className="[overflow-wrap:anywhere]">{account.email}</span> {account.emailVerified && <span className="whitespace-nowrap text-ok">(confirmed)</span>}
      </p>
      <form noValidate onSubmit={handleSubmit(onSubmit)} className="mt-3 flex flex-col gap-3">
        <TextField label="New e-mail address" type="email" autoComplete="email" registration={register('email')} error={formState.errors.email} hint="We send a link to the new address; your address changes when you open it." />
        <Button type="submit" variant="secondary" disabled={change.isPending} className="self-start">
          Change e-mail address
        </Button>
        {sentTo && (
          <Notice tone="success">
            We sent a link to <span className="[overflow-wrap:anywhere]">{sentTo}</span>. Open it to start using that address; until then you keep signing in with {account.email}.
          </Notice>
        )}
        {change.isError && <Notice tone="error">{change.error.message}</Notice>}
      </form>
    </div>
  );
}
