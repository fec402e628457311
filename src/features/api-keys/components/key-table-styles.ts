// The admin tables' look (src/features/admin/components/table-styles.ts), kept here because
// features do not import one another.
export const tableWrapClass = 'relative overflow-x-auto rounded-xl border border-ink-100 bg-paper-50';
export const tableClass = 'w-full border-collapse text-sm';
export const theadClass = 'border-b border-ink-200 bg-paper-200/60 text-left text-ink-800';
export const thClass = 'px-3 py-2.5 text-left font-bold';
export const tdClass = 'px-3 py-2.5 align-top';
export const rowClass = 'border-b border-ink-100 last:border-b-0';
