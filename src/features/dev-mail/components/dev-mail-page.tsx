import { Fragment } from 'react';
import { Notice } from '../../../components/notice.tsx';
import { Page } from '../../../components/page.tsx';
import { useDevMail, type CapturedMail } from '../api/get-mail.ts';

/** Plain text with its http(s) links made clickable; nothing from the mail is parsed as HTML. */
function LinkedText({ text }: { text: string }) {
  const parts = text.split(/(https?:\/\/[^\s<>"]+)/g);
  return (
    <>
      {parts.map((part, index) =>
        /^https?:\/\//.test(part) ? (
          <a key={index} href={part} className="break-all text-ember-700 underline">
            {part}
          </a>
        ) : (
          <Fragment key={index}>{part}</Fragment>
        ),
      )}
    </>
  );
}

function MailItem({ mail }: { mail: CapturedMail }) {
  return (
    <article className="rounded-lg border border-rule bg-white p-4" aria-label={mail.subject}>
      <h2 className="font-semibold">{mail.subject}</h2>
      <p className="text-sm text-ink-soft">
        To {mail.to.join(', ')} · {new Date(mail.receivedAt).toLocaleString()}
      </p>
      <pre className="mt-3 font-sans text-sm whitespace-pre-wrap">
        <LinkedText text={mail.text} />
      </pre>
    </article>
  );
}

export function DevMailPage() {
  const mail = useDevMail();
  return (
    <Page title="Local mailbox" intro="In development, Canwright keeps the mail it sends here instead of delivering it. Newest first." width="wide">
      {mail.isError && <Notice tone="error">The local mailbox is only there in development, when no SMTP_URL is set.</Notice>}
      {mail.data?.messages.length === 0 && <p className="text-ink-soft">No mail yet.</p>}
      <div className="flex flex-col gap-4">
        {mail.data?.messages.map((message) => (
          <MailItem key={message.id} mail={message} />
        ))}
      </div>
    </Page>
  );
}
