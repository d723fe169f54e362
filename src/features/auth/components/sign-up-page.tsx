import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { useNavigate, useSearchParams } from 'react-router';
import type { z } from 'zod';
import { Button } from '../../../components/button.tsx';
import { Notice } from '../../../components/notice.tsx';
import { Page } from '../../../components/page.tsx';
import { SignInLink } from '../../../components/sign-in-link.tsx';
import { TextField } from '../../../components/text-field.tsx';
import { authClient, authErrorMessage } from '../../../lib/auth-client.ts';
import { signUpFormSchema } from '../form-schemas.ts';
import { safeNextPath, withNext } from '../next-path.ts';
import { verifyCallbackUrl } from '../../../../shared/account/links.ts';

type SignUpForm = z.infer<typeof signUpFormSchema>;

export function SignUpPage() {
  const navigate = useNavigate();
  const [params] = useSearchParams();
  // Carried through the confirmation mail to the sign-in page, which goes back there.
  const next = safeNextPath(params.get('next'));
  const [failure, setFailure] = useState<string>();
  const { register, handleSubmit, formState } = useForm<SignUpForm>({ resolver: zodResolver(signUpFormSchema) });

  async function onSubmit(form: SignUpForm) {
    setFailure(undefined);
    const { error } = await authClient.signUp.email({ name: form.name, email: form.email, password: form.password, callbackURL: withNext(verifyCallbackUrl, next) });
    if (error) return setFailure(authErrorMessage(error, 'The account could not be created.'));
    await navigate(withNext(`/verify?sent=${encodeURIComponent(form.email)}`, next));
  }

  return (
    <Page title="Create your account" intro="An account keeps your stove designs, their versions and your test burns.">
      <form noValidate onSubmit={handleSubmit(onSubmit)} className="flex flex-col gap-4">
        {failure && <Notice tone="error">{failure}</Notice>}
        <TextField label="Name" autoComplete="name" registration={register('name')} error={formState.errors.name} />
        <TextField label="E-mail" type="email" autoComplete="email" registration={register('email')} error={formState.errors.email} />
        <TextField label="Password" type="password" autoComplete="new-password" hint="At least 8 characters." registration={register('password')} error={formState.errors.password} />
        <TextField label="Password again" type="password" autoComplete="new-password" registration={register('confirm')} error={formState.errors.confirm} />
        <Button type="submit" disabled={formState.isSubmitting}>
          {formState.isSubmitting ? 'Creating…' : 'Create account'}
        </Button>
        <p className="text-sm text-ink-soft">
          Have an account already?{' '}
          <SignInLink className="text-ember-700 underline">Sign in</SignInLink>
        </p>
      </form>
    </Page>
  );
}
