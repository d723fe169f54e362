import { useEffect, useRef, useState, type FormEvent } from 'react';
import { Link, useNavigate, useSearchParams } from 'react-router';
import { Button } from '../../../components/button.tsx';
import { Notice } from '../../../components/notice.tsx';
import { Page } from '../../../components/page.tsx';
import { useAccount } from '../../account/api/get-account.ts';
import { useJoinWorkshop } from '../api/workshop-mutations.ts';

/** The code an instructor shows on a screen, typed in. */
export function JoinByCode() {
  const join = useJoinWorkshop();
  const navigate = useNavigate();
  const [code, setCode] = useState('');
  async function submit(event: FormEvent) {
    event.preventDefault();
    const workshop = await join.mutateAsync({ code }).catch(() => undefined);
    if (workshop) await navigate(`/workshops/${workshop.id}`);
  }
  return (
    <form onSubmit={(e) => void submit(e)} className="flex flex-col gap-2 rounded-lg border border-rule bg-white p-4">
      <label className="flex flex-col gap-1 font-semibold">
        Join with a code
        <input value={code} onChange={(e) => setCode(e.target.value)} autoCapitalize="characters" autoComplete="off" placeholder="e.g. K7QM3XPA" className="min-h-11 rounded-md border border-rule bg-white px-3 py-2 font-mono text-base tracking-widest uppercase" />
      </label>
      <p className="text-sm text-ink-soft">Joining tells the instructor who you are; they see the burns and photos you log for the workshop.</p>
      {join.isError && <Notice tone="error">{join.error.message}</Notice>}
      <Button type="submit" disabled={join.isPending || code.trim() === ''} className="self-start">
        Join
      </Button>
    </form>
  );
}

/** /workshops/join?token=… (an invitation link) or ?code=…: signs the person in or up first, then joins. */
export function JoinPage() {
  const [search] = useSearchParams();
  const token = search.get('token') ?? undefined;
  const code = search.get('code') ?? undefined;
  const { data: account, isPending } = useAccount();
  const join = useJoinWorkshop();
  const navigate = useNavigate();
  const tried = useRef(false);
  const here = `/workshops/join?${search.toString()}`;

  useEffect(() => {
    if (!account || tried.current || (!token && !code)) return;
    tried.current = true;
    join.mutate(token ? { token } : { code }, { onSuccess: (workshop) => void navigate(`/workshops/${workshop.id}`, { replace: true }) });
  }, [account, token, code, join, navigate]);

  if (isPending) return <p className="p-8 text-ink-soft">Loading…</p>;
  if (!token && !code) return <Page title="Join a workshop"><JoinByCode /></Page>;
  if (!account) {
    return (
      <Page title="Join a workshop" intro={<p>You were invited to a Canwright workshop. Sign in, or make an account with the address the invitation came to; you come back here after.</p>}>
        <div className="flex flex-wrap gap-2">
          <Link to={`/sign-up?next=${encodeURIComponent(here)}`} className="inline-flex min-h-11 items-center rounded-md bg-ember-600 px-4 text-sm font-medium text-white">
            Make an account
          </Link>
          <Link to={`/sign-in?next=${encodeURIComponent(here)}`} className="inline-flex min-h-11 items-center rounded-md border border-rule bg-white px-4 text-sm font-medium">
            Sign in
          </Link>
        </div>
      </Page>
    );
  }
  return (
    <Page title="Join a workshop">
      {join.isError ? <Notice tone="error">{join.error.message}</Notice> : <p className="text-ink-soft">Joining…</p>}
      <p className="mt-4">
        <Link to="/workshops" className="text-ember-700 underline">
          Your workshops
        </Link>
      </p>
    </Page>
  );
}
