import { secondaryButtonClass } from './form-styles';

interface PaginationProps {
  page: number;
  pageSize: number;
  total: number;
  onPage: (page: number) => void;
  /** What the rows are, for the summary: "users", "entries". */
  noun: string;
}

/** Previous / next with "21–40 of 57 users"; pages count from 1. */
export function Pagination({ page, pageSize, total, onPage, noun }: PaginationProps) {
  const pages = Math.max(1, Math.ceil(total / pageSize));
  const first = total === 0 ? 0 : (page - 1) * pageSize + 1;
  const last = Math.min(total, page * pageSize);
  return (
    <nav aria-label={`Pages of ${noun}`} className="mt-4 flex flex-wrap items-center justify-between gap-3 text-sm">
      <p className="font-semibold text-ink-700" aria-live="polite">
        {total === 0 ? `No ${noun}` : `${first}–${last} of ${total} ${noun}`} · page {page} of {pages}
      </p>
      <div className="flex gap-2">
        <button type="button" className={secondaryButtonClass} disabled={page <= 1} onClick={() => onPage(page - 1)}>
          ← Previous
        </button>
        <button type="button" className={secondaryButtonClass} disabled={page >= pages} onClick={() => onPage(page + 1)}>
          Next →
        </button>
      </div>
    </nav>
  );
}
