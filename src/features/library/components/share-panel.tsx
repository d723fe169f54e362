import { useId, useRef, useState } from 'react';
import type { DesignDetail } from '../../../../shared/library/library-schemas.ts';
import { Button } from '../../../components/button.tsx';
import { Notice } from '../../../components/notice.tsx';
import { useShareDesign } from '../api/share-design.ts';
import { useUnshareDesign } from '../api/unshare-design.ts';

/** Turns a read-only share link on or off and shows the whole link to copy. */
export function SharePanel({ design }: { design: DesignDetail }) {
  const linkId = useId();
  const input = useRef<HTMLInputElement>(null);
  const share = useShareDesign();
  const unshare = useUnshareDesign();
  const [status, setStatus] = useState<{ tone: 'success' | 'error'; text: string }>();
  // Said in a live region that is always there, so a screen reader hears each copy.
  const [copied, setCopied] = useState<{ ok: boolean; text: string }>();
  const busy = share.isPending || unshare.isPending;
  const link = design.shareUrlPath ? `${location.origin}${design.shareUrlPath}` : undefined;

  async function change(turnOn: boolean) {
    setStatus(undefined);
    setCopied(undefined);
    try {
      await (turnOn ? share : unshare).mutateAsync(design.id);
      setStatus({ tone: 'success', text: turnOn ? 'Sharing is on. Anyone with the link can see and print this design.' : 'Sharing is off. The old link no longer works.' });
    } catch (error) {
      setStatus({ tone: 'error', text: (error as Error).message });
    }
  }

  async function copy() {
    if (!link) return;
    setCopied(undefined);
    try {
      await navigator.clipboard.writeText(link);
      setCopied({ ok: true, text: 'Link copied.' });
    } catch {
      // The clipboard can be refused (permissions, a page not served over HTTPS); selecting the
      // text lets the maker copy it by hand.
      input.current?.focus();
      input.current?.select();
      setCopied({ ok: false, text: 'This browser would not copy the link, so it is selected: press Ctrl+C (⌘C on a Mac) to copy it.' });
    }
  }

  return (
    <section aria-labelledby={`${linkId}-heading`} className="flex flex-col gap-2">
      <h2 id={`${linkId}-heading`} className="font-semibold">
        Share
      </h2>
      {link ? (
        <>
          <label htmlFor={linkId} className="text-sm">
            Share link (anyone with it can view and print the current version, without an account)
          </label>
          <div className="flex flex-wrap gap-2">
            <input id={linkId} ref={input} readOnly value={link} onFocus={(e) => e.target.select()} className="min-h-10 w-full min-w-0 rounded-md border border-rule bg-paper px-3 font-mono text-sm" />
            <Button variant="secondary" onClick={() => void copy()}>
              Copy link
            </Button>
            <Button variant="danger" disabled={busy} onClick={() => void change(false)}>
              Stop sharing
            </Button>
          </div>
          <p role="status" className={`text-sm ${copied?.ok ? 'font-medium text-ok' : ''}`}>
            {copied?.text}
          </p>
        </>
      ) : (
        <div className="flex flex-wrap items-center gap-3">
          <p className="text-sm text-ink-soft">Not shared. A link lets a friend view and print this design without an account.</p>
          <Button variant="secondary" disabled={busy} onClick={() => void change(true)}>
            Share a link
          </Button>
        </div>
      )}
      {status && <Notice tone={status.tone}>{status.text}</Notice>}
    </section>
  );
}
