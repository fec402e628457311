import type { ReferenceCase } from '../../../../shared/spec/template-spec';

const kindWords: Record<ReferenceCase['kind'], string> = {
  published: 'Published worked example',
  'closed-form': 'Closed-form derivation',
  'trade-practice': 'Common trade practice',
  'from-memory': 'Recalled from memory (to be confirmed)',
};

/** The cases the template is checked against, with where each comes from. */
export function ReferencesList({ references }: { references: readonly ReferenceCase[] }) {
  if (references.length === 0) return <p className="text-sm text-ink-700">This template lists no reference cases.</p>;
  return (
    <ul className="grid gap-3">
      {references.map((r) => (
        <li key={r.label} className="rounded-xl border border-ink-100 bg-paper-50 p-4 text-sm">
          <p className="font-bold text-ink-950">{r.label}</p>
          <p className="mt-0.5 text-xs font-bold tracking-wide text-ink-600 uppercase">{kindWords[r.kind]}</p>
          <p className="mt-1.5 leading-relaxed text-ink-800">{r.source}</p>
        </li>
      ))}
    </ul>
  );
}
