import { useId, useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { cardClass, inputClass, secondaryButtonClass } from '../../../components/form-styles';
import { Notice } from '../../../components/notice';
import { Pagination } from '../../../components/pagination';
import { ApiError } from '../../../lib/api-client';
import { formErrorsFrom } from '../../../lib/form-errors';
import { formatDateTime } from '../../../lib/format-time';
import { useDebouncedValue } from '../../../lib/use-debounced-value';
import { useMail } from '../api/get-mail';
import { MailViewer } from './mail-viewer';

const PAGE_SIZE = 20;

/** Every message the development mail server received, newest first; one opened beside the list. */
export function MailOutbox() {
  const [params, setParams] = useSearchParams();
  const [to, setTo] = useState('');
  const [page, setPage] = useState(1);
  const settledTo = useDebouncedValue(to.trim(), 300);
  const mail = useMail({ to: settledTo || undefined, page, pageSize: PAGE_SIZE });
  const toId = useId();
  const selected = Number(params.get('mail')) || null;

  const open = (id: number) => {
    const next = new URLSearchParams(params);
    next.set('mail', String(id));
    setParams(next, { replace: true });
  };

  if (mail.isError && mail.error instanceof ApiError && mail.error.status === 404) {
    return (
      <Notice title="The outbox is for development only">
        This server runs in production mode, where mail goes out through the configured SMTP server and is not kept here.
      </Notice>
    );
  }

  return (
    <div className="grid gap-6 lg:grid-cols-[22rem_minmax(0,1fr)]">
      <section aria-labelledby="outbox-list-heading" className="grid content-start gap-3">
        <h2 id="outbox-list-heading" className="sr-only">
          Received messages
        </h2>
        <div className="flex items-end gap-2">
          <div className="flex-1">
            <label htmlFor={toId} className="block text-sm font-bold text-ink-900">
              Addressee
            </label>
            <input id={toId} type="search" value={to} onChange={(e) => { setTo(e.target.value); setPage(1); }} className={`${inputClass} mt-1.5`} placeholder="e.g. name@example.com" />
          </div>
          <button type="button" className={secondaryButtonClass} onClick={() => void mail.refetch()} disabled={mail.isFetching}>
            {mail.isFetching ? 'Loading…' : 'Refresh'}
          </button>
        </div>
        {mail.isError && <Notice tone="error" title="The outbox could not be loaded">{formErrorsFrom(mail.error).summary}</Notice>}
        {mail.isPending && <p role="status" className="text-sm text-ink-700">Loading the outbox…</p>}
        {mail.data && (
          <>
            {mail.data.items.length === 0 ? (
              <p className="rounded-xl border border-dashed border-ink-300 bg-paper-50 p-4 text-sm text-ink-800">No message has arrived{settledTo ? ' for this addressee' : ''} yet.</p>
            ) : (
              <ul className="divide-y divide-ink-100 overflow-hidden rounded-xl border border-ink-100 bg-paper-50" aria-label="Messages">
                {mail.data.items.map((m) => {
                  const current = m.id === selected;
                  return (
                    <li key={m.id}>
                      <button
                        type="button"
                        onClick={() => open(m.id)}
                        aria-current={current ? 'true' : undefined}
                        className={`block w-full border-l-4 px-4 py-3 text-left ${current ? 'border-ink-700 bg-ink-50' : 'border-transparent hover:bg-paper-100'}`}
                        data-mail-row={m.to}
                      >
                        <span className="block truncate font-bold text-ink-950">{m.subject || '(no subject)'}</span>
                        <span className="block truncate text-sm text-ink-800">to {m.to}</span>
                        <span className="block text-xs text-ink-700">{formatDateTime(m.receivedAt)}</span>
                        {current && <span className="sr-only"> (open)</span>}
                      </button>
                    </li>
                  );
                })}
              </ul>
            )}
            <Pagination page={mail.data.page} pageSize={mail.data.pageSize} total={mail.data.total} noun="messages" onPage={setPage} />
          </>
        )}
      </section>
      <div className={cardClass}>
        {selected ? <MailViewer key={selected} mailId={selected} /> : <p className="text-sm text-ink-700">Choose a message to read it.</p>}
      </div>
    </div>
  );
}
