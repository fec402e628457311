import type { ReactNode } from 'react';

/** The common frame of a content page: one h1, an optional lead, then the body. */
export function Page({ title, lead, children }: { title: string; lead?: ReactNode; children?: ReactNode }) {
  return (
    <div className="mx-auto max-w-page px-4 py-10 sm:px-6 sm:py-14">
      <title>{`${title} · Pinwork`}</title>
      <h1 className="text-3xl font-extrabold tracking-tight text-ink-950 sm:text-4xl">{title}</h1>
      {lead && <p className="mt-3 max-w-2xl text-lg leading-relaxed text-ink-800">{lead}</p>}
      {children && <div className="mt-8">{children}</div>}
    </div>
  );
}
