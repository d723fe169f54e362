import { useEffect } from 'react';
import { useAccount } from '../account/api/get-account.ts';
import { draftStore } from './draft-store.ts';

/**
 * Keeps the draft with the person signed in, on every page: signing in carries a visitor's
 * work into the account; signing out (or a lapsed session) puts the account's work aside.
 */
export function useDraftFollowsAccount(): void {
  const { data: account, isSuccess } = useAccount();
  const id = isSuccess ? (account?.id ?? null) : undefined;
  useEffect(() => {
    if (id !== undefined) draftStore.follow(id);
  }, [id]);
}
