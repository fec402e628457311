import { ApiReferencePage } from '../../features/api-reference/components/api-reference-page';

/** /developers/api: the v1 reference with its viewer, loaded as a route chunk of its own. */
export function ApiReferenceRoute() {
  return <ApiReferencePage />;
}
