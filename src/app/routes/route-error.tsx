import { isRouteErrorResponse, Link, useRouteError } from 'react-router-dom';
import { AppShell } from '../../components/app-shell';
import { Page } from '../../components/page';
import { ApiError } from '../../lib/api-client';

function describe(error: unknown): { title: string; detail: string } {
  if (isRouteErrorResponse(error)) {
    return { title: `${error.status} ${error.statusText}`, detail: String(error.data ?? '') };
  }
  if (error instanceof ApiError) {
    return { title: error.problem.title, detail: error.problem.detail ?? '' };
  }
  if (error instanceof Error) return { title: 'Something went wrong', detail: error.message };
  return { title: 'Something went wrong', detail: 'An unexpected error stopped this page.' };
}

/** Shown in place of a route that threw while loading or rendering. */
export function RouteErrorBoundary() {
  const error = useRouteError();
  const { title, detail } = describe(error);
  return (
    <AppShell>
      <Page title={title} lead="This page could not be shown. Nothing you entered has been sent.">
        <div role="alert" className="max-w-2xl rounded-xl border border-verdict-fail/30 bg-paper-50 p-5 text-sm text-ink-900">
          {detail || 'No further detail was given.'}
        </div>
        <Link to="/" className="mt-6 inline-block rounded-lg bg-ink-800 px-5 py-3 text-sm font-bold text-paper-50 hover:bg-ink-700">
          Back to the start page
        </Link>
      </Page>
    </AppShell>
  );
}
