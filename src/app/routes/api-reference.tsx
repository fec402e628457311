import { ApiReferencePage } from '../../features/api-reference/components/api-reference-page';
import { useHealth } from '../../features/health/api/get-health';

/** /developers/api: the v1 reference with its viewer, loaded as a route chunk of its own. */
export function ApiReferenceRoute() {
  const health = useHealth();
  // A server whose health cannot be read offers no demo key either.
  const mode = health.data?.mode ?? (health.isError ? 'production' : undefined);
  return <ApiReferencePage serverMode={mode} />;
}
