import type { ValidatorFunctions } from '@rjsf/validator-ajv8/lib/types.js';

declare global {
  interface Window {
    /** Filled by each validator script the server serves: content hash → ajv's compiled functions. */
    pinworkInputValidators?: Record<string, ValidatorFunctions>;
  }
}

const loading = new Map<string, Promise<ValidatorFunctions>>();

/**
 * Loads a template version's precompiled input validator. It is a same-origin script made by
 * the server, so the Content-Security-Policy (script-src 'self', no eval) lets it run, where
 * ajv compiling the schema in the browser would be blocked.
 */
export function loadInputValidator(url: string, contentHash: string): Promise<ValidatorFunctions> {
  const ready = window.pinworkInputValidators?.[contentHash];
  if (ready) return Promise.resolve(ready);
  let pending = loading.get(contentHash);
  if (!pending) {
    pending = new Promise<ValidatorFunctions>((resolve, reject) => {
      const script = document.createElement('script');
      script.src = url;
      script.async = true;
      script.onload = () => {
        const fns = window.pinworkInputValidators?.[contentHash];
        if (fns) resolve(fns);
        else reject(new Error(`The input validator at ${url} did not register version ${contentHash.slice(0, 12)}.`));
      };
      script.onerror = () => reject(new Error(`The input validator at ${url} could not be loaded.`));
      document.head.append(script);
    });
    pending.catch(() => loading.delete(contentHash));
    loading.set(contentHash, pending);
  }
  return pending;
}
