import { useId } from 'react';
import { useSearchParams } from 'react-router-dom';
import { ApiError } from '../../../lib/api-client';
import { useTemplates } from '../api/get-templates';
import { categoryLabel, type Category } from './category-label';
import { filterTemplates } from './filter-templates';
import { TemplateCard } from './template-card';

const inputClass =
  'w-full rounded-lg border border-ink-200 bg-paper-50 px-3 py-2.5 text-base text-ink-950 shadow-inner placeholder:text-ink-500 focus:border-ink-500';

/** Every published template, filtered by category and by words; both kept in the URL. */
export function TemplateLibrary() {
  const templates = useTemplates();
  const [params, setParams] = useSearchParams();
  const category = params.get('category') ?? '';
  const search = params.get('q') ?? '';
  const searchId = useId();
  const categoryId = useId();

  const update = (key: string, value: string) => {
    const next = new URLSearchParams(params);
    if (value) next.set(key, value);
    else next.delete(key);
    setParams(next, { replace: true });
  };

  if (templates.isPending) {
    return <p className="text-ink-700" role="status">Loading the templates…</p>;
  }
  if (templates.isError) {
    const error = templates.error;
    return (
      <div role="alert" className="max-w-2xl rounded-xl border border-verdict-fail/40 bg-paper-50 p-5 text-sm text-ink-900">
        <p className="font-bold">The template list could not be loaded.</p>
        <p className="mt-1">{error instanceof ApiError ? error.message : 'The request failed.'}</p>
        <button
          type="button"
          onClick={() => void templates.refetch()}
          className="mt-3 rounded-md bg-ink-800 px-3 py-1.5 font-semibold text-paper-50 hover:bg-ink-700"
        >
          Try again
        </button>
      </div>
    );
  }

  const all = templates.data.templates;
  const categories = [...new Set(all.map((t) => t.category))] as Category[];
  const shown = filterTemplates(all, category, search);

  return (
    <>
      <div role="search" aria-label="Find a template" className="grid gap-4 rounded-2xl border border-ink-100 bg-paper-50 p-4 sm:grid-cols-[1fr_16rem] sm:p-5">
        <div>
          <label htmlFor={searchId} className="block text-sm font-bold text-ink-900">
            Search by words
          </label>
          <input
            id={searchId}
            type="search"
            value={search}
            onChange={(e) => update('q', e.target.value)}
            placeholder="e.g. tie rod, clamp, linkage"
            className={`${inputClass} mt-1.5`}
          />
        </div>
        <div>
          <label htmlFor={categoryId} className="block text-sm font-bold text-ink-900">
            Category
          </label>
          <select id={categoryId} value={category} onChange={(e) => update('category', e.target.value)} className={`${inputClass} mt-1.5`}>
            <option value="">All categories</option>
            {categories.map((c) => (
              <option key={c} value={c}>
                {categoryLabel(c)}
              </option>
            ))}
          </select>
        </div>
      </div>

      <p className="mt-6 text-sm font-semibold text-ink-700" role="status" aria-live="polite">
        {shown.length === all.length
          ? `${all.length} template${all.length === 1 ? '' : 's'}`
          : `${shown.length} of ${all.length} templates match`}
      </p>
      {shown.length > 0 ? (
        <ul className="mt-3 grid gap-5 sm:grid-cols-2 lg:grid-cols-3" aria-label="Templates">
          {shown.map((t) => (
            <TemplateCard key={t.slug} template={t} />
          ))}
        </ul>
      ) : (
        <p className="mt-3 rounded-xl border border-dashed border-ink-300 bg-paper-50 p-5 text-sm text-ink-800">
          No template matches these words{category ? ` in ${categoryLabel(category as Category)}` : ''}. Try fewer words or
          all categories.
        </p>
      )}
    </>
  );
}
