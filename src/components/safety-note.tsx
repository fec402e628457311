/** The caution every page that talks about loads carries (owner's rule 5). */
export function SafetyNote({ compact = false }: { compact?: boolean }) {
  if (compact) {
    return (
      <p>
        Pinwork is a design aid for a qualified person. Rated loads, design factors, proof tests,
        inspection and marking follow the standards that apply where a device is used (for example
        ASME B30.20 with ASME BTH-1, or EN 13155) and local regulations.
      </p>
    );
  }
  return (
    <aside
      aria-labelledby="safety-heading"
      className="rounded-xl border-l-4 border-signal-500 bg-signal-50 p-5 text-ink-900"
    >
      <h2 id="safety-heading" className="text-base font-bold">
        Before a number lifts or clamps anything
      </h2>
      <p className="mt-2 text-sm leading-relaxed">
        A statics result is one input to a design, not an approval. Pinwork is a design aid for a
        qualified person: rated loads, design factors, proof tests, inspection and marking follow
        the standards that apply where the device is used — for example ASME B30.20 with ASME
        BTH-1, or EN 13155 — together with local regulations and licensed engineering practice.
      </p>
    </aside>
  );
}
