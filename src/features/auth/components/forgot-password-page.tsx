import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '../../../components/button.tsx';
import { Notice } from '../../../components/notice.tsx';
import { Page } from '../../../components/page.tsx';
import { TextField } from '../../../components/text-field.tsx';
import { authClient, authErrorMessage } from '../../../lib/auth-client.ts';
import { emailFormSchema } from '../form-schemas.ts';
import { resetPasswordPath } from '../../../../shared/account/links.ts';

type EmailForm = z.infer<typeof emailFormSchema>;

export function ForgotPasswordPage() {
  const [sentTo, setSentTo] = useState<string>();
  const [failure, setFailure] = useState<string>();
  const { register, handleSubmit, formState } = useForm<EmailForm>({ resolver: zodResolver(emailFormSchema) });

  async function onSubmit(form: EmailForm) {
    setFailure(undefined);
    const { error } = await authClient.requestPasswordReset({ email: form.email, redirectTo: resetPasswordPath });
    if (error) return setFailure(authErrorMessage(error, 'The reset link could not be sent.'));
    setSentTo(form.email);
  }

  return (
    <Page title="Reset your password" intro="Enter the address you signed up with; we will send a link to choose a new password.">
      <form noValidate onSubmit={handleSubmit(onSubmit)} className="flex flex-col gap-4">
        {sentTo && <Notice tone="success">If {sentTo} belongs to an account, a reset link is on its way. It works for one hour.</Notice>}
        {failure && <Notice tone="error">{failure}</Notice>}
        <TextField label="E-mail" type="email" autoComplete="email" registration={register('email')} error={formState.errors.email} />
        <Button type="submit" disabled={formState.isSubmitting}>
          Send reset link
        </Button>
      </form>
    </Page>
  );
}
