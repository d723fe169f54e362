import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Link, useNavigate, useSearchParams } from 'react-router';
import type { z } from 'zod';
import { Button } from '../../../components/button.tsx';
import { Notice } from '../../../components/notice.tsx';
import { Page } from '../../../components/page.tsx';
import { TextField } from '../../../components/text-field.tsx';
import { authClient, authErrorMessage } from '../../../lib/auth-client.ts';
import { newPasswordFormSchema } from '../form-schemas.ts';

type NewPasswordForm = z.infer<typeof newPasswordFormSchema>;

/** The page a reset link lands on: better-auth passes ?token=... (or ?error=INVALID_TOKEN). */
export function ResetPasswordPage() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const token = params.get('token');
  const [failure, setFailure] = useState<string>();
  const { register, handleSubmit, formState } = useForm<NewPasswordForm>({ resolver: zodResolver(newPasswordFormSchema) });

  async function onSubmit(form: NewPasswordForm) {
    if (!token) return;
    setFailure(undefined);
    const { error } = await authClient.resetPassword({ newPassword: form.password, token });
    if (error) return setFailure(authErrorMessage(error, 'The password could not be changed.'));
    await navigate('/sign-in?reset=1', { replace: true });
  }

  if (!token || params.get('error'))
    return (
      <Page title="This link did not work">
        <Notice tone="error">The reset link is not valid any more (links work for one hour and only once).</Notice>
        <p className="mt-4">
          <Link to="/forgot-password" className="font-medium text-ember-700 underline">
            Ask for a new link
          </Link>
        </p>
      </Page>
    );

  return (
    <Page title="Choose a new password">
      <form noValidate onSubmit={handleSubmit(onSubmit)} className="flex flex-col gap-4">
        {failure && <Notice tone="error">{failure}</Notice>}
        <TextField label="New password" type="password" autoComplete="new-password" hint="At least 8 characters." registration={register('password')} error={formState.errors.password} />
        <TextField label="New password again" type="password" autoComplete="new-password" registration={register('confirm')} error={formState.errors.confirm} />
        <Button type="submit" disabled={formState.isSubmitting}>
          Save new password
        </Button>
      </form>
    </Page>
  );
}
