import type { DemoApiKey } from '../../../../shared/api/demo-key';
import { Notice } from '../../../components/notice';

/** Which key "Try it out" uses: the development server's demo key, or the reader's own. */
export function DemoKeyNotice({ demoKey }: { demoKey: DemoApiKey | null }) {
  if (!demoKey) {
    return (
      <Notice title="Try it out with your own key">
        Choose Authorize in the reference below and paste a secret key of your organisation. Requests go from this page to this server; the key stays in this tab and is
        forgotten when you leave.
      </Notice>
    );
  }
  return (
    <Notice title="Development server: the demo key is filled in">
      <p>
        &ldquo;Try it out&rdquo; runs straight away as {demoKey.organisation} with <code className="font-mono text-[0.8rem] break-all">{demoKey.key}</code> (scopes{' '}
        {demoKey.scopes.join(', ')}). This key exists only on development servers; a production server never has it.
      </p>
    </Notice>
  );
}
