// One look for every form control and button outside the calculator's own widgets.
export const inputClass =
  'w-full rounded-lg border border-ink-200 bg-paper-50 px-3 py-2.5 text-base text-ink-950 shadow-inner placeholder:text-ink-500 focus:border-ink-500 aria-[invalid=true]:border-verdict-fail aria-[invalid=true]:border-2';

export const primaryButtonClass =
  'inline-flex items-center justify-center gap-2 rounded-lg bg-ink-800 px-5 py-2.5 text-sm font-bold text-paper-50 hover:bg-ink-700 disabled:cursor-not-allowed disabled:opacity-60';

export const secondaryButtonClass =
  'inline-flex items-center justify-center gap-2 rounded-lg border border-ink-300 bg-paper-50 px-4 py-2 text-sm font-bold text-ink-800 hover:bg-ink-50 disabled:cursor-not-allowed disabled:opacity-60';

export const dangerButtonClass =
  'inline-flex items-center justify-center gap-2 rounded-lg bg-verdict-fail px-4 py-2 text-sm font-bold text-paper-50 hover:brightness-110 disabled:cursor-not-allowed disabled:opacity-60';

export const linkClass = 'font-semibold text-ink-700 underline decoration-ink-300 underline-offset-2 hover:text-ink-900 hover:decoration-ink-600';

export const cardClass = 'rounded-2xl border border-ink-100 bg-paper-50 p-5 shadow-sm sm:p-6';
