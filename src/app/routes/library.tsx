import { Link } from 'react-router-dom';
import { Page } from '../../components/page';

export function LibraryRoute() {
  return (
    <Page
      title="Template library"
      lead="Coming soon. The library will list the built-in and published templates — tongs, plate clamps, toggle clamps, A-frames, jib arms — each with its inputs, checks and reference cases."
    >
      <p className="max-w-2xl rounded-xl border border-dashed border-ink-300 bg-paper-50 p-5 text-sm leading-relaxed text-ink-800">
        No templates are available in this build yet, so nothing can be solved here today. Read{' '}
        <Link to="/how-it-works" className="font-semibold text-ink-700 underline underline-offset-2">
          how a solve works
        </Link>{' '}
        to see what each template will do.
      </p>
    </Page>
  );
}
