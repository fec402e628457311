import { Link, useLocation } from 'react-router-dom';
import { Page } from '../../components/page';

export function NotFoundRoute() {
  const location = useLocation();
  return (
    <Page title="Page not found" lead={<>Nothing lives at <code className="rounded bg-paper-200 px-1.5 py-0.5 text-base">{location.pathname}</code>.</>}>
      <Link to="/" className="rounded-lg bg-ink-800 px-5 py-3 text-sm font-bold text-paper-50 hover:bg-ink-700">
        Back to the start page
      </Link>
    </Page>
  );
}
