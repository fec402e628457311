interface SortHeaderProps<K extends string> {
  label: string;
  sortKey: K;
  sort: K;
  order: 'asc' | 'desc';
  onSort: (key: K, order: 'asc' | 'desc') => void;
}

/** A column heading that sorts on the server; the arrow is repeated in words for screen readers. */
export function SortHeader<K extends string>({ label, sortKey, sort, order, onSort }: SortHeaderProps<K>) {
  const active = sort === sortKey;
  const next = active && order === 'asc' ? 'desc' : 'asc';
  return (
    <th scope="col" aria-sort={active ? (order === 'asc' ? 'ascending' : 'descending') : 'none'} className="px-3 py-2.5 text-left">
      <button type="button" onClick={() => onSort(sortKey, next)} className="inline-flex items-center gap-1 rounded font-bold text-ink-800 hover:text-ink-950">
        {label}
        <span aria-hidden="true" className={active ? 'text-ink-900' : 'text-ink-300'}>
          {active ? (order === 'asc' ? '▲' : '▼') : '↕'}
        </span>
        <span className="sr-only">{active ? `, sorted ${order === 'asc' ? 'ascending' : 'descending'}` : ', sort'}</span>
      </button>
    </th>
  );
}
