import { zodResolver } from '@hookform/resolvers/zod';
import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Link, useNavigate, useSearchParams } from 'react-router';
import type { z } from 'zod';
import { Button } from '../../../components/button.tsx';
import { Notice } from '../../../components/notice.tsx';
import { Page } from '../../../components/page.tsx';
import { TextField } from '../../../components/text-field.tsx';
import { authClient, authErrorMessage } from '../../../lib/auth-client.ts';
import { accountQueryKey } from '../../account/api/get-account.ts';
import { signInFormSchema } from '../form-schemas.ts';
import { safeNextPath, withNext } from '../next-path.ts';

type SignInForm = z.infer<typeof signInFormSchema>;

export function SignInPage() {
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  const [params] = useSearchParams();
  const [failure, setFailure] = useState<string>();
  // Back to where the person was: only ever a path on this site (see safeNextPath).
  const next = safeNextPath(params.get('next'));
  const { register, handleSubmit, formState } = useForm<SignInForm>({ resolver: zodResolver(signInFormSchema) });

  async function onSubmit(form: SignInForm) {
    setFailure(undefined);
    const { error } = await authClient.signIn.email({ email: form.email, password: form.password });
    if (error) return setFailure(authErrorMessage(error, 'Signing in failed.'));
    await queryClient.invalidateQueries({ queryKey: accountQueryKey });
    await navigate(next ?? '/account', { replace: true });
  }

  return (
    <Page title="Sign in">
      <form noValidate onSubmit={handleSubmit(onSubmit)} className="flex flex-col gap-4">
        {params.get('reset') && <Notice tone="success">Your password is changed. Sign in with the new one.</Notice>}
        {failure && <Notice tone="error">{failure}</Notice>}
        <TextField label="E-mail" type="email" autoComplete="email" registration={register('email')} error={formState.errors.email} />
        <TextField label="Password" type="password" autoComplete="current-password" registration={register('password')} error={formState.errors.password} />
        <Button type="submit" disabled={formState.isSubmitting}>
          {formState.isSubmitting ? 'Signing in…' : 'Sign in'}
        </Button>
        <p className="flex flex-wrap justify-between gap-2 text-sm text-ink-soft">
          <Link to="/forgot-password" className="text-ember-700 underline">
            Forgot your password?
          </Link>
          <Link to={withNext('/sign-up', next)} className="text-ember-700 underline">
            Create an account
          </Link>
        </p>
      </form>
    </Page>
  );
}
