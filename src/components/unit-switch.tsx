import type { UnitSystem } from '../../shared/units/unit-systems';

const options: { value: UnitSystem; label: string; hint: string }[] = [
  { value: 'SI', label: 'SI', hint: 'mm, N, kg' },
  { value: 'US', label: 'US', hint: 'in, lbf, lb' },
];

/** SI / US customary as a pair of radio buttons (arrow keys move between them). */
export function UnitSwitch({ value, onChange }: { value: UnitSystem; onChange: (system: UnitSystem) => void }) {
  return (
    <fieldset className="flex items-center gap-2">
      <legend className="sr-only">Units</legend>
      <span aria-hidden="true" className="text-sm font-bold text-ink-800">Units</span>
      <div className="flex rounded-full border border-ink-200 bg-paper-50 p-0.5">
        {options.map((o) => (
          <label
            key={o.value}
            className={`cursor-pointer rounded-full px-3 py-1 text-sm font-bold transition-colors has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-signal-400 ${
              value === o.value ? 'bg-ink-800 text-paper-50' : 'text-ink-800 hover:bg-ink-50'
            }`}
          >
            <input
              type="radio"
              name="unit-system"
              value={o.value}
              checked={value === o.value}
              onChange={() => onChange(o.value)}
              className="sr-only"
            />
            {o.label} <span className={`text-xs font-semibold ${value === o.value ? 'text-ink-100' : 'text-ink-600'}`}>{o.hint}</span>
          </label>
        ))}
      </div>
    </fieldset>
  );
}
