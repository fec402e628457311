import { formatNumber } from '../../../../shared/units/format';
import type { ResultRow } from './result-rows';

const sections: ResultRow['section'][] = ['Results', 'Member forces', 'Joint forces', 'Derived values'];

/** The solve's numbers: label, value, unit, grouped; stale results are dimmed and say so. */
export function ResultsTable({ rows, stale }: { rows: ResultRow[]; stale: boolean }) {
  return (
    <div className={`overflow-x-auto transition-opacity ${stale ? 'opacity-55' : ''}`}>
      <table className="w-full min-w-[20rem] border-collapse text-sm" aria-describedby="results-status">
        <caption className="sr-only">Results of the solve{stale ? ' (stale: for the previous inputs)' : ''}</caption>
        <thead>
          <tr className="border-b-2 border-ink-200 text-left text-xs tracking-wide text-ink-700 uppercase">
            <th scope="col" className="py-2 pr-3 font-bold">Quantity</th>
            <th scope="col" className="py-2 pr-1 text-right font-bold">Value</th>
            <th scope="col" className="py-2 pl-1 font-bold">Unit</th>
          </tr>
        </thead>
        {sections.map((section) => {
          const inSection = rows.filter((r) => r.section === section);
          if (inSection.length === 0) return null;
          return (
            <tbody key={section} className={section === 'Derived values' ? 'print:hidden' : ''}>
              <tr>
                <th colSpan={3} scope="colgroup" className="pt-4 pb-1 text-left text-xs font-extrabold tracking-wide text-ink-600 uppercase">
                  {section}
                </th>
              </tr>
              {inSection.map((row) => (
                <tr key={`${section}-${row.key}`} className="border-b border-ink-100 align-top" data-result={section === 'Results' ? row.key : undefined}>
                  <th scope="row" className="py-2 pr-3 text-left font-semibold text-ink-900">
                    {row.label}
                    {row.plain && <span className="block text-xs font-normal text-ink-700">{row.plain}</span>}
                    {!row.plain && row.note && <span className="block text-xs font-normal text-ink-600">{row.note}</span>}
                  </th>
                  <td className="py-2 pr-1 text-right font-bold whitespace-nowrap text-ink-950 tabular-nums" data-value>
                    {row.value === null ? '—' : formatNumber(row.value)}
                  </td>
                  <td className="py-2 pl-1 whitespace-nowrap text-ink-700">{row.unit}</td>
                </tr>
              ))}
            </tbody>
          );
        })}
      </table>
    </div>
  );
}
