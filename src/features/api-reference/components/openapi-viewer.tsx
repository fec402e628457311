import { useEffect, useMemo, useRef } from 'react';
import SwaggerUI from 'swagger-ui-react';
import 'swagger-ui-react/swagger-ui.css';
import type { OpenApiDocument } from '../api/get-openapi-document';
import { groupOperations } from './group-operations';
import './openapi-viewer.css';

interface ViewerSystem {
  preauthorizeApiKey: (scheme: string, value: string) => void;
}

// The document's bearer scheme (components.securitySchemes).
const SCHEME = 'apiKey';

// Our page carries the title, the intro and the safety note, so the viewer's own info block
// renders nothing. The document has one server (/api/v1 on this origin): no server picker,
// which would also be a select without a label.
const ourFraming = () => ({ components: { InfoContainer: () => null, ServersContainer: () => null } });

/**
 * Swagger UI on the v1 document. "Try it out" sends the request from this page to the
 * document's server (/api/v1, this origin) with the key from Authorize, or the demo key
 * filled in on a development server. Nothing is kept in local storage.
 */
export function OpenApiViewer({ document, demoKey }: { document: OpenApiDocument; demoKey: string | null }) {
  const spec = useMemo(() => groupOperations(document), [document]);
  const system = useRef<ViewerSystem | null>(null);
  const plugins = useMemo(() => [ourFraming], []);

  useEffect(() => {
    if (demoKey && system.current) system.current.preauthorizeApiKey(SCHEME, demoKey);
  }, [demoKey]);

  // The viewer wraps its operations in a <main> of its own, inside the page's <main>: a page
  // has one main landmark, so the viewer's becomes a labelled region, whenever it re-renders.
  const box = useRef<HTMLDivElement>(null);
  useEffect(() => {
    const root = box.current;
    if (!root) return;
    const demote = () => {
      for (const inner of root.querySelectorAll('main:not([role])')) {
        inner.setAttribute('role', 'region');
        inner.setAttribute('aria-label', 'Operations of the API');
      }
    };
    demote();
    const watcher = new MutationObserver(demote);
    watcher.observe(root, { childList: true, subtree: true });
    return () => watcher.disconnect();
  }, []);

  return (
    <div className="pinwork-openapi" ref={box}>
      <SwaggerUI
        spec={spec}
        plugins={plugins}
        docExpansion="list"
        defaultModelsExpandDepth={0}
        displayRequestDuration
        persistAuthorization={false}
        queryConfigEnabled={false}
        supportedSubmitMethods={['get', 'post']}
        onComplete={(s: ViewerSystem) => {
          system.current = s;
          if (demoKey) s.preauthorizeApiKey(SCHEME, demoKey);
        }}
      />
    </div>
  );
}
