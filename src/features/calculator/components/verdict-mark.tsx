export type Verdict = 'pass' | 'warn' | 'fail';

const looks: Record<Verdict, { word: string; symbol: string; className: string }> = {
  pass: { word: 'Pass', symbol: '✓', className: 'bg-verdict-pass text-paper-50' },
  warn: { word: 'Warning', symbol: '!', className: 'bg-verdict-warn text-paper-50' },
  fail: { word: 'Fail', symbol: '✕', className: 'bg-verdict-fail text-paper-50' },
};

/** A verdict as a symbol and a word together: colour never carries it alone. */
export function VerdictMark({ verdict }: { verdict: Verdict }) {
  const look = looks[verdict];
  return (
    <span className={`inline-flex shrink-0 items-center gap-1.5 rounded-full px-2.5 py-0.5 text-xs font-extrabold tracking-wide uppercase ${look.className}`}>
      <span aria-hidden="true">{look.symbol}</span>
      {look.word}
    </span>
  );
}
