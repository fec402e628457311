import { Notice } from '../../../components/notice';
import { Page } from '../../../components/page';
import { SafetyNote } from '../../../components/safety-note';
import { formErrorsFrom } from '../../../lib/form-errors';
import { useDemoKey } from '../api/get-demo-key';
import { openApiUrl, useOpenApiDocument } from '../api/get-openapi-document';
import { ApiGuide } from './api-guide';
import { DemoKeyNotice } from './demo-key-notice';
import { OpenApiViewer } from './openapi-viewer';

interface Props {
  /** How the server runs (from its health answer); undefined while that is not known yet. */
  serverMode: 'development' | 'production' | 'test' | undefined;
}

export function ApiReferencePage({ serverMode }: Props) {
  const document = useOpenApiDocument();
  // Only a development server has the demo key, so a production page asks for nothing that must fail.
  const wantsKey = serverMode === 'development';
  const demoKey = useDemoKey(wantsKey);
  const keyPending = serverMode === undefined || (wantsKey && demoKey.isPending);
  const key = wantsKey ? (demoKey.data ?? null) : null;
  return (
    <Page
      title="API reference"
      lead={
        <>
          Results, sweeps and sensitivity data of published templates for your own systems — a quoting tool, a product configurator, a shop page. Every operation
          below can be tried from this page; the machine-readable version is{' '}
          <a href={openApiUrl} className="font-semibold text-ink-700 underline decoration-ink-300 underline-offset-2 hover:text-ink-900">
            openapi.json
          </a>{' '}
          (OpenAPI 3.1).
        </>
      }
    >
      <ApiGuide />
      <div className="mt-6 max-w-3xl">
        <SafetyNote />
      </div>
      <section aria-labelledby="operations-heading" className="mt-10">
        <h2 id="operations-heading" className="text-2xl font-extrabold tracking-tight text-ink-950">
          Operations
        </h2>
        <div className="mt-4 max-w-3xl">{keyPending ? null : <DemoKeyNotice demoKey={key} />}</div>
        {document.isPending && (
          <p role="status" className="mt-4 text-sm text-ink-700">
            Loading the API description…
          </p>
        )}
        {document.isError && (
          <div className="mt-4">
            <Notice tone="error" title="The API description could not be loaded">
              {formErrorsFrom(document.error).summary}
            </Notice>
          </div>
        )}
        {document.data && !keyPending && (
          <div className="mt-4">
            <OpenApiViewer document={document.data} demoKey={key?.key ?? null} />
          </div>
        )}
      </section>
    </Page>
  );
}
