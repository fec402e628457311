import { useEffect, useId, useRef, useState } from 'react';
import type { CreatedApiKey } from '../../../../shared/api/v1';
import { secondaryButtonClass } from '../../../components/form-styles';
import { curlExample } from './curl-example';

type CopyState = 'idle' | 'copied' | 'failed';

function CopyButton({ text, what }: { text: string; what: string }) {
  const [state, setState] = useState<CopyState>('idle');
  const copy = async () => {
    try {
      await navigator.clipboard.writeText(text);
      setState('copied');
    } catch {
      setState('failed');
    }
  };
  return (
    <span className="inline-flex flex-wrap items-center gap-2">
      <button type="button" className={secondaryButtonClass} onClick={() => void copy()}>
        Copy<span className="sr-only"> {what}</span>
      </button>
      <span role="status" className="text-sm font-semibold text-ink-700">
        {state === 'copied' ? 'Copied.' : state === 'failed' ? 'This browser did not allow copying: select the text and copy it yourself.' : ''}
      </span>
    </span>
  );
}

/**
 * The whole key, the one time it exists outside its owner's systems. Focus comes here when the
 * creation or rotation dialog closes, so a keyboard or screen-reader user lands on it.
 */
export function NewKeyPanel({ created, rotated, onDone }: { created: CreatedApiKey; rotated: boolean; onDone: () => void }) {
  const ref = useRef<HTMLDivElement>(null);
  const titleId = useId();
  const keyId = useId();
  const curl = curlExample(window.location.origin, created.key, created.info);
  useEffect(() => {
    ref.current?.focus();
  }, [created.key]);

  return (
    <div
      ref={ref}
      tabIndex={-1}
      role="region"
      aria-labelledby={titleId}
      className="grid gap-4 rounded-xl border-2 border-signal-500 bg-signal-50 p-4 outline-none focus-visible:ring-4 focus-visible:ring-signal-300 sm:p-5"
      data-new-key={created.info.prefix}
    >
      <div>
        <h3 id={titleId} className="text-lg font-extrabold tracking-tight text-ink-950">
          {rotated ? 'The new key for' : 'Your new key'} “{created.info.name}”
        </h3>
        <p className="mt-1 text-sm leading-relaxed font-semibold text-signal-900">
          Copy it now and keep it somewhere safe. Pinwork stores only a fingerprint of it and will not show it again; if it is
          lost, rotate or revoke the key and make another.
        </p>
      </div>
      <div>
        <label htmlFor={keyId} className="block text-sm font-bold text-ink-900">
          {created.info.kind === 'secret' ? 'Secret key (for your servers only)' : 'Publishable key (for the web pages of its origins)'}
        </label>
        <textarea
          id={keyId}
          readOnly
          rows={2}
          value={created.key}
          onFocus={(e) => e.currentTarget.select()}
          className="mt-1.5 w-full resize-none rounded-lg border border-ink-200 bg-paper-50 px-3 py-2 font-mono text-sm break-all text-ink-950"
          data-secret-key
        />
        <div className="mt-2">
          <CopyButton text={created.key} what="the key" />
        </div>
      </div>
      <div>
        <p className="text-sm font-bold text-ink-900">A first call with it</p>
        <pre className="mt-1.5 overflow-x-auto rounded-lg bg-ink-950 p-3 font-mono text-xs leading-relaxed whitespace-pre-wrap break-all text-paper-50" data-curl>
          {curl}
        </pre>
        <div className="mt-2">
          <CopyButton text={curl} what="the curl command" />
        </div>
      </div>
      <div>
        <button type="button" className={secondaryButtonClass} onClick={onDone}>
          I have stored the key
        </button>
      </div>
    </div>
  );
}
