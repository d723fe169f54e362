import { AppError, notFound } from '../http/app-error.ts';
import type { ObjectStore } from '../storage/object-store.ts';
import type { AccountRepository } from './account-repository.ts';

/**
 * Deleting an account with everything in it. The password is asked again; the photo files go
 * from the store (disk or S3) before the rows, inside the transaction that deletes the rows, so
 * a store that cannot delete just now leaves the account whole to try again, never rows gone and
 * files left behind.
 */
export function createAccountDeletion(deps: { accounts: AccountRepository; store: ObjectStore; passwordMatches: (userId: string, password: string) => Promise<boolean> }) {
  return {
    async deleteAccount(user: { id: string; role: string }, password: string): Promise<void> {
      if (!(await deps.passwordMatches(user.id, password))) {
        throw new AppError(400, 'INVALID_INPUT', 'That is not your password, so the account was not deleted.', { fields: [{ path: 'password', message: 'is not your password' }] });
      }
      if (user.role === 'admin' && (await deps.accounts.otherAdmins(user.id)) === 0) {
        throw new AppError(409, 'LAST_ADMIN', 'You are the only administrator of this Canwright site. Make another account an administrator first, then delete yours.');
      }
      const deleted = await deps.accounts.deleteUser(user.id, async (keys) => {
        try {
          await deps.store.delete(keys);
        } catch (error) {
          console.error(`Could not delete ${keys.length} stored file(s) of account ${user.id}: ${(error as Error).message}`);
          throw new AppError(503, 'STORAGE_UNAVAILABLE', 'Your photos could not be deleted from storage just now, so your account was not deleted. Try again in a few minutes.', undefined, { 'Retry-After': '60' });
        }
      });
      if (!deleted) throw notFound('Your account');
    },
  };
}

export type AccountDeletion = ReturnType<typeof createAccountDeletion>;
