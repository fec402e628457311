/** The template's cautions, always in view beside the results (owner's rule 5). */
export function CautionsPanel({ cautions }: { cautions: readonly string[] }) {
  if (cautions.length === 0) return null;
  return (
    <aside aria-labelledby="cautions-heading" className="rounded-2xl border-l-4 border-signal-500 bg-signal-50 p-4 text-ink-900 sm:p-5 print:break-inside-avoid print:p-2">
      <h2 id="cautions-heading" className="flex items-center gap-2 text-base font-extrabold">
        <span aria-hidden="true" className="inline-flex size-5 items-center justify-center rounded-full bg-signal-600 text-xs text-paper-50">!</span>
        Cautions
      </h2>
      <ul className="mt-2 list-disc space-y-1.5 pl-5 text-sm leading-relaxed print:text-xs">
        {cautions.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
    </aside>
  );
}
