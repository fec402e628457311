import { Notice } from '../../../components/notice';
import { formErrorsFrom } from '../../../lib/form-errors';
import { formatDateTime } from '../../../lib/format-time';
import { mailHtmlHref, useMailMessage } from '../api/get-mail-message';
import { linksIn } from './mail-links';

/**
 * One received message. The HTML part is shown from its own address in a sandboxed frame (no
 * scripts, no forms, no same-origin rights); the server serves it under a policy of its own.
 */
export function MailViewer({ mailId }: { mailId: number }) {
  const message = useMailMessage(mailId);
  if (message.isPending) return <p role="status" className="text-sm text-ink-700">Opening the message…</p>;
  if (message.isError) return <Notice tone="error" title="The message could not be opened">{formErrorsFrom(message.error).summary}</Notice>;
  const m = message.data;
  const links = linksIn(m.text);
  return (
    <article aria-labelledby="mail-subject" className="grid gap-4" data-mail-id={m.id}>
      <header className="grid gap-1 border-b border-ink-100 pb-4">
        <h2 id="mail-subject" className="text-xl font-extrabold tracking-tight text-ink-950">
          {m.subject || '(no subject)'}
        </h2>
        <dl className="grid grid-cols-[4.5rem_1fr] gap-x-3 gap-y-0.5 text-sm">
          <dt className="font-bold text-ink-700">To</dt>
          <dd className="wrap-anywhere" data-mail-to>{m.to}</dd>
          <dt className="font-bold text-ink-700">From</dt>
          <dd className="wrap-anywhere">{m.from}</dd>
          <dt className="font-bold text-ink-700">Received</dt>
          <dd>{formatDateTime(m.receivedAt)}</dd>
        </dl>
      </header>
      {links.length > 0 && (
        <section aria-labelledby="mail-links-heading">
          <h3 id="mail-links-heading" className="text-sm font-bold text-ink-900">
            Links in this message
          </h3>
          <ul className="mt-1 grid gap-1 text-sm">
            {links.map((url) => (
              <li key={url}>
                <a href={url} className="font-semibold wrap-anywhere text-ink-700 underline underline-offset-2 hover:text-ink-950" data-mail-link>
                  {url}
                </a>
              </li>
            ))}
          </ul>
        </section>
      )}
      <section aria-labelledby="mail-html-heading">
        <h3 id="mail-html-heading" className="text-sm font-bold text-ink-900">
          As the reader sees it (HTML part)
        </h3>
        {m.html ? (
          <iframe
            title={`HTML part of “${m.subject}”`}
            src={mailHtmlHref(m.id)}
            sandbox=""
            referrerPolicy="no-referrer"
            className="mt-2 h-[28rem] w-full rounded-xl border border-ink-200 bg-white"
          />
        ) : (
          <p className="mt-1 text-sm text-ink-700">This message has no HTML part.</p>
        )}
      </section>
      <section aria-labelledby="mail-text-heading">
        <h3 id="mail-text-heading" className="text-sm font-bold text-ink-900">
          Text part
        </h3>
        {m.text ? (
          <pre className="mt-2 max-h-[24rem] overflow-auto rounded-xl border border-ink-200 bg-paper-100 p-4 text-sm leading-relaxed wrap-anywhere whitespace-pre-wrap text-ink-950" data-mail-text>
            {m.text}
          </pre>
        ) : (
          <p className="mt-1 text-sm text-ink-700">This message has no text part.</p>
        )}
      </section>
    </article>
  );
}
