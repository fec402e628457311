import { useId, useState, type FormEvent } from 'react';
import type { ApiKeyInfo, CreatedApiKey } from '../../../../shared/api/v1';
import { inputClass, primaryButtonClass, secondaryButtonClass } from '../../../components/form-styles';
import { Notice } from '../../../components/notice';
import { formErrorsFrom } from '../../../lib/form-errors';
import type { KeyOwner } from '../api/key-owner';
import { useRotateKey } from '../api/rotate-key';

export const graceChoices = [
  { seconds: 0, label: 'None: the old key stops at once' },
  { seconds: 3600, label: 'One hour' },
  { seconds: 86_400, label: 'One day' },
  { seconds: 7 * 86_400, label: 'One week' },
  { seconds: 30 * 86_400, label: 'Thirty days (the longest)' },
] as const;

/** A new key in place of the old, which keeps working for the grace period the owner picks. */
export function RotateKeyForm({ owner, apiKey, onRotated, onCancel }: { owner: KeyOwner; apiKey: ApiKeyInfo; onRotated: (created: CreatedApiKey) => void; onCancel: () => void }) {
  const [grace, setGrace] = useState(86_400);
  const rotate = useRotateKey(owner);
  const id = useId();
  const submit = (event: FormEvent) => {
    event.preventDefault();
    rotate.mutate({ keyId: apiKey.id, graceSeconds: grace }, { onSuccess: onRotated });
  };
  return (
    <form onSubmit={submit} className="mt-2 grid gap-4" aria-label={`Rotate ${apiKey.name}`}>
      <p className="text-sm leading-relaxed text-ink-800">
        A new key with the same scopes{apiKey.kind === 'publishable' ? ' and origins' : ''} replaces <code className="font-mono">{apiKey.prefix}…</code>. Until the end
        of the grace period both keys work, so your systems can move to the new one without a gap.
      </p>
      {rotate.isError && <Notice tone="error" title="The key was not rotated">{formErrorsFrom(rotate.error).summary}</Notice>}
      <div>
        <label htmlFor={`${id}-grace`} className="block text-sm font-bold text-ink-900">
          The old key keeps working for
        </label>
        <select id={`${id}-grace`} value={grace} onChange={(e) => setGrace(Number(e.target.value))} className={`${inputClass} mt-1.5`}>
          {graceChoices.map((g) => (
            <option key={g.seconds} value={g.seconds}>
              {g.label}
            </option>
          ))}
        </select>
      </div>
      <div className="flex flex-wrap justify-end gap-3">
        <button type="button" className={secondaryButtonClass} onClick={onCancel}>
          Cancel
        </button>
        <button type="submit" className={primaryButtonClass} disabled={rotate.isPending}>
          {rotate.isPending ? 'Rotating…' : 'Make the new key'}
        </button>
      </div>
    </form>
  );
}
