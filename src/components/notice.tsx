import type { ReactNode } from 'react';

type Tone = 'info' | 'success' | 'error';

const tones: Record<Tone, { box: string; mark: string; symbol: string; label: string }> = {
  info: { box: 'border-ink-200 bg-ink-50', mark: 'bg-ink-600', symbol: 'i', label: 'Note' },
  success: { box: 'border-verdict-pass/40 bg-paper-50', mark: 'bg-verdict-pass', symbol: '✓', label: 'Done' },
  error: { box: 'border-verdict-fail/50 bg-paper-50', mark: 'bg-verdict-fail', symbol: '!', label: 'Problem' },
};

/** A boxed message with a mark and a hidden word for its kind, so colour never carries it alone. */
export function Notice({ tone = 'info', title, children }: { tone?: Tone; title?: string; children?: ReactNode }) {
  const t = tones[tone];
  return (
    <div role={tone === 'error' ? 'alert' : 'status'} className={`flex gap-3 rounded-xl border p-4 text-sm text-ink-900 ${t.box}`}>
      <span aria-hidden="true" className={`mt-0.5 inline-flex size-5 shrink-0 items-center justify-center rounded-full text-xs font-extrabold text-paper-50 ${t.mark}`}>
        {t.symbol}
      </span>
      <div className="min-w-0">
        <span className="sr-only">{t.label}: </span>
        {title && <p className="font-bold">{title}</p>}
        {children && <div className={title ? 'mt-1 leading-relaxed' : 'leading-relaxed'}>{children}</div>}
      </div>
    </div>
  );
}
