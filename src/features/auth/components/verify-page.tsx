import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { useSearchParams } from 'react-router';
import type { z } from 'zod';
import { Button } from '../../../components/button.tsx';
import { Notice } from '../../../components/notice.tsx';
import { Page } from '../../../components/page.tsx';
import { SignInLink } from '../../../components/sign-in-link.tsx';
import { TextField } from '../../../components/text-field.tsx';
import { authClient, authErrorMessage } from '../../../lib/auth-client.ts';
import { emailFormSchema } from '../form-schemas.ts';
import { safeNextPath, withNext } from '../next-path.ts';
import { verifyCallbackUrl } from '../../../../shared/account/links.ts';

type EmailForm = z.infer<typeof emailFormSchema>;

/**
 * Both ends of e-mail confirmation: "we sent you a link" after sign-up, and the page the
 * link lands on (better-auth adds ?error=... when the token is bad or expired).
 */
export function VerifyPage() {
  const [params] = useSearchParams();
  const sentTo = params.get('sent');
  const error = params.get('error');
  const verified = params.get('verified') && !error;
  const [resent, setResent] = useState<string>();
  const [failure, setFailure] = useState<string>();
  const { register, handleSubmit, formState } = useForm<EmailForm>({ resolver: zodResolver(emailFormSchema), defaultValues: { email: sentTo ?? '' } });

  async function resend(form: EmailForm) {
    setFailure(undefined);
    const { error: sendError } = await authClient.sendVerificationEmail({ email: form.email, callbackURL: withNext(verifyCallbackUrl, safeNextPath(params.get('next'))) });
    if (sendError) return setFailure(authErrorMessage(sendError, 'The link could not be sent.'));
    setResent(form.email);
  }

  if (verified)
    return (
      <Page title="E-mail address confirmed">
        <Notice tone="success">Thank you: your address is confirmed and your account is ready.</Notice>
        <p className="mt-4">
          <SignInLink className="font-medium text-ember-700 underline">Sign in</SignInLink>
        </p>
      </Page>
    );

  return (
    <Page title={error ? 'This link did not work' : 'Check your e-mail'}>
      <div className="flex flex-col gap-4">
        {error ? (
          <Notice tone="error">The confirmation link is not valid any more (links work for one hour and only once). Ask for a new one below.</Notice>
        ) : (
          <p>
            We sent a confirmation link to <strong>{sentTo ?? 'your address'}</strong>. Open it to finish setting up your account, then sign in.
          </p>
        )}
        {resent && <Notice tone="success">A new link is on its way to {resent}.</Notice>}
        {failure && <Notice tone="error">{failure}</Notice>}
        <form noValidate onSubmit={handleSubmit(resend)} className="flex flex-col gap-4">
          <TextField label="E-mail" type="email" autoComplete="email" registration={register('email')} error={formState.errors.email} />
          <Button type="submit" variant="secondary" disabled={formState.isSubmitting}>
            Send a new link
          </Button>
        </form>
      </div>
    </Page>
  );
}
