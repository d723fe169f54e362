import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '../../../components/button.tsx';
import { Notice } from '../../../components/notice.tsx';
import { TextField } from '../../../components/text-field.tsx';
import { authClient, authErrorMessage } from '../../../lib/auth-client.ts';
import { changePasswordFormSchema } from '../../auth/form-schemas.ts';

type ChangePasswordForm = z.infer<typeof changePasswordFormSchema>;

export function ChangePasswordForm() {
  const [result, setResult] = useState<{ tone: 'success' | 'error'; text: string }>();
  const { register, handleSubmit, formState, reset } = useForm<ChangePasswordForm>({ resolver: zodResolver(changePasswordFormSchema) });

  async function onSubmit(form: ChangePasswordForm) {
    setResult(undefined);
    const { error } = await authClient.changePassword({ currentPassword: form.current, newPassword: form.password, revokeOtherSessions: true });
    if (error) return setResult({ tone: 'error', text: authErrorMessage(error, 'The password could not be changed.') });
    reset();
    setResult({ tone: 'success', text: 'Password changed. Other devices where you were signed in have been signed out.' });
  }

  return (
    <section aria-labelledby="password-heading" className="rounded-lg border border-rule bg-white p-5 md:col-span-2">
      <h2 id="password-heading" className="text-lg font-semibold">
        Change password
      </h2>
      <form noValidate onSubmit={handleSubmit(onSubmit)} className="mt-3 grid gap-4 md:grid-cols-3">
        <TextField label="Current password" type="password" autoComplete="current-password" registration={register('current')} error={formState.errors.current} />
        <TextField label="New password" type="password" autoComplete="new-password" registration={register('password')} error={formState.errors.password} />
        <TextField label="New password again" type="password" autoComplete="new-password" registration={register('confirm')} error={formState.errors.confirm} />
        <div className="flex flex-col gap-3 md:col-span-3 md:flex-row md:items-center">
          <Button type="submit" disabled={formState.isSubmitting}>
            Change password
          </Button>
          {result && <Notice tone={result.tone}>{result.text}</Notice>}
        </div>
      </form>
    </section>
  );
}
