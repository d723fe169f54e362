import { useMutation } from '@tanstack/react-query';
import { emailChangedCallbackUrl } from '../../../../shared/account/account-changes.ts';
import { authClient, authErrorMessage } from '../../../lib/auth-client.ts';

/**
 * Asks for a new address (better-auth's /change-email): a link goes to the new address, and the
 * account keeps the old one until it is opened. The answer is the same whether or not another
 * account has that address, so the form says the same either way.
 */
export async function changeEmail(newEmail: string): Promise<void> {
  const { error } = await authClient.changeEmail({ newEmail, callbackURL: emailChangedCallbackUrl });
  if (error) throw new Error(authErrorMessage(error, 'The address could not be changed. Try again.'));
}

export function useChangeEmail() {
  return useMutation({ mutationFn: changeEmail });
}
