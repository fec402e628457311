import { Link } from 'react-router-dom';
import type { TemplateSummary } from '../api/get-templates';
import { categoryLabel } from './category-label';

/** One template in the library: its own small drawing, what it is, and the way in. */
export function TemplateCard({ template }: { template: TemplateSummary }) {
  const titleId = `template-${template.slug}-title`;
  return (
    <li className="group relative flex flex-col overflow-hidden rounded-2xl border border-ink-100 bg-paper-50 shadow-sm transition-shadow focus-within:shadow-md focus-within:ring-4 focus-within:ring-signal-300 hover:shadow-md">
      <div
        className="flex aspect-[16/10] items-center justify-center border-b border-ink-100 bg-[linear-gradient(135deg,var(--color-ink-50),var(--color-paper-50))] p-4 [&>svg]:h-full [&>svg]:w-full"
        // The server draws this from the template's default geometry (shared/drawing); it is
        // trusted markup with role="img" and a title of its own.
        dangerouslySetInnerHTML={{ __html: template.thumbnailSvg }}
      />
      <div className="flex flex-1 flex-col gap-2 p-5">
        <p className="text-xs font-bold tracking-wide text-ink-600 uppercase">{categoryLabel(template.category)}</p>
        <h2 id={titleId} className="text-lg leading-snug font-bold text-ink-950">
          <Link
            to={`/templates/${template.slug}`}
            className="after:absolute after:inset-0 after:content-[''] hover:underline focus-visible:underline"
          >
            {template.title}
          </Link>
        </h2>
        <p className="text-sm leading-relaxed text-ink-800">{template.summary}</p>
        <p className="mt-auto pt-2 text-xs font-semibold text-ink-600">
          Version {template.version}
          <span aria-hidden="true" className="float-right text-ink-700 transition-transform group-hover:translate-x-0.5">
            Open calculator →
          </span>
        </p>
      </div>
    </li>
  );
}
