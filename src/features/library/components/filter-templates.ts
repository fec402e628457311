import type { TemplateSummary } from '../api/get-templates';

/**
 * Templates whose title, summary or category contain every word of the search (in any order,
 * any case), within the chosen category.
 */
export function filterTemplates(templates: readonly TemplateSummary[], category: string, search: string): TemplateSummary[] {
  const words = search.toLowerCase().split(/\s+/).filter(Boolean);
  return templates.filter((t) => {
    if (category && t.category !== category) return false;
    const haystack = `${t.title} ${t.summary} ${t.category} ${t.slug}`.toLowerCase();
    return words.every((w) => haystack.includes(w));
  });
}
