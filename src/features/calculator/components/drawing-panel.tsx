import { useId, useRef, type KeyboardEvent } from 'react';
import type { TextAlternative } from '../../../../shared/drawing/forces-text';

export interface DrawingView {
  id: string;
  /** Tab label: "Mechanism", "Free body: Boom". */
  label: string;
  /** Trusted markup from shared/drawing (role="img", a title and a description of its own). */
  svg: string;
}

interface DrawingPanelProps {
  views: DrawingView[];
  selected: string;
  onSelect: (id: string) => void;
  text: TextAlternative | null;
  stale: boolean;
}

/**
 * The mechanism and each part's free body as tabs (arrow keys move between them, as a tab
 * list should), and the drawing in words for screen readers and anyone who opens it.
 */
export function DrawingPanel({ views, selected, onSelect, text, stale }: DrawingPanelProps) {
  const baseId = useId();
  const tabs = useRef<(HTMLButtonElement | null)[]>([]);
  const current = views.find((v) => v.id === selected) ?? views[0];
  const onKeyDown = (event: KeyboardEvent, index: number) => {
    const last = views.length - 1;
    const next =
      event.key === 'ArrowRight' ? (index === last ? 0 : index + 1)
      : event.key === 'ArrowLeft' ? (index === 0 ? last : index - 1)
      : event.key === 'Home' ? 0
      : event.key === 'End' ? last
      : null;
    if (next === null) return;
    event.preventDefault();
    onSelect(views[next]!.id);
    tabs.current[next]?.focus();
  };
  if (!current) return null;
  return (
    <div>
      <div role="tablist" aria-label="Drawing" className="flex flex-wrap gap-1.5 print:hidden">
        {views.map((v, i) => {
          const active = v.id === current.id;
          return (
            <button
              key={v.id}
              ref={(el) => {
                tabs.current[i] = el;
              }}
              id={`${baseId}-tab-${v.id}`}
              type="button"
              role="tab"
              aria-selected={active}
              aria-controls={`${baseId}-panel`}
              tabIndex={active ? 0 : -1}
              onClick={() => onSelect(v.id)}
              onKeyDown={(e) => onKeyDown(e, i)}
              className={`rounded-full border px-3.5 py-1.5 text-sm font-bold transition-colors ${
                active ? 'border-ink-800 bg-ink-800 text-paper-50' : 'border-ink-200 bg-paper-50 text-ink-800 hover:border-ink-400'
              }`}
            >
              {v.label}
            </button>
          );
        })}
      </div>
      <div
        id={`${baseId}-panel`}
        role="tabpanel"
        aria-labelledby={`${baseId}-tab-${current.id}`}
        data-view={current.id}
        className={`mt-3 overflow-hidden rounded-xl border border-ink-100 bg-paper-50 transition-opacity [&>svg]:h-auto [&>svg]:w-full ${stale ? 'opacity-60' : ''}`}
        dangerouslySetInnerHTML={{ __html: current.svg }}
      />
      {text && (
        <details className="mt-3 rounded-xl border border-ink-100 bg-paper-50 px-4 py-3 text-sm text-ink-900 print:hidden">
          <summary className="cursor-pointer font-bold text-ink-800">The drawing in words</summary>
          <p className="mt-2">{text.summary}</p>
          {text.sections.map((s) => (
            <div key={s.heading} className="mt-3">
              <h4 className="font-bold">{s.heading}</h4>
              <ul className="mt-1 list-disc space-y-0.5 pl-5">
                {s.items.map((item) => (
                  <li key={item}>{item}</li>
                ))}
              </ul>
            </div>
          ))}
        </details>
      )}
    </div>
  );
}
