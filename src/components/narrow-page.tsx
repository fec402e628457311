import type { ReactNode } from 'react';

/** A page with one short task (sign in, reset a password): a heading and one card, centred. */
export function NarrowPage({ title, lead, children, footer }: { title: string; lead?: ReactNode; children: ReactNode; footer?: ReactNode }) {
  return (
    <div className="mx-auto w-full max-w-lg px-4 py-10 sm:px-6 sm:py-14">
      <title>{`${title} · Pinwork`}</title>
      <h1 className="text-3xl font-extrabold tracking-tight text-ink-950">{title}</h1>
      {lead && <p className="mt-3 leading-relaxed text-ink-800">{lead}</p>}
      <div className="mt-6 rounded-2xl border border-ink-100 bg-paper-50 p-5 shadow-sm sm:p-7">{children}</div>
      {footer && <div className="mt-5 text-sm text-ink-800">{footer}</div>}
    </div>
  );
}
