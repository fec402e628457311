import { useId, useState, type FormEvent } from 'react';
import { apiScopes, createApiKeyRequestSchema, type ApiKeyKindName, type ApiScope, type CreatedApiKey } from '../../../../shared/api/v1';
import { inputClass, primaryButtonClass, secondaryButtonClass } from '../../../components/form-styles';
import { Notice } from '../../../components/notice';
import { FieldError, TextField } from '../../../components/text-field';
import { fieldErrorsFromIssues, formErrorsFrom, withFieldName } from '../../../lib/form-errors';
import { useCreateKey } from '../api/create-key';
import type { KeyOwner } from '../api/key-owner';
import { kindNames, scopeNames } from './key-status';

const scopeHints: Record<ApiScope, string> = {
  read: 'the template list and each template’s inputs',
  solve: 'results, checks and member forces',
  sweep: 'a result over a range of one input',
  sensitivity: 'which inputs move a result most',
  author: 'validate and solve your own template specs',
};

/** A date field's day as the end of that day in the reader's time zone, as the API wants it. */
export function expiryFromDay(day: string): string | undefined {
  if (!day) return undefined;
  const end = new Date(`${day}T23:59:59`);
  return Number.isNaN(end.getTime()) ? day : end.toISOString();
}

export function originsFromText(text: string): string[] {
  return text
    .split(/[\s,]+/)
    .map((o) => o.trim())
    .filter(Boolean);
}

/** Name, kind, scopes, origins for a publishable key, an optional expiry and rate; checked here, then by the server. */
export function CreateKeyForm({ owner, onCreated, onCancel }: { owner: KeyOwner; onCreated: (created: CreatedApiKey) => void; onCancel: () => void }) {
  const [name, setName] = useState('');
  const [kind, setKind] = useState<ApiKeyKindName>('secret');
  const [scopes, setScopes] = useState<ApiScope[]>(['read', 'solve']);
  const [origins, setOrigins] = useState('');
  const [expiry, setExpiry] = useState('');
  const [rate, setRate] = useState('');
  const [localErrors, setLocalErrors] = useState<Record<string, string>>({});
  const create = useCreateKey(owner);
  const server = formErrorsFrom(create.error);
  const errors = { ...server.fields, ...localErrors };
  // A field's own message goes as soon as it is edited; the rest stay until the next try.
  const edited = (field: string) => setLocalErrors(({ [field]: _gone, ...rest }) => rest);
  const id = useId();

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const body = {
      name,
      kind,
      scopes: kind === 'publishable' ? scopes.filter((s) => s !== 'author') : scopes,
      allowedOrigins: kind === 'publishable' ? originsFromText(origins) : [],
      ...(expiry ? { expiresAt: expiryFromDay(expiry) } : {}),
      ...(rate.trim() ? { ratePerMinute: Number(rate) } : {}),
    };
    const parsed = createApiKeyRequestSchema.safeParse(body);
    if (!parsed.success) {
      setLocalErrors(fieldErrorsFromIssues(parsed.error.issues));
      return;
    }
    setLocalErrors({});
    create.mutate(parsed.data, { onSuccess: onCreated });
  };

  const toggleScope = (scope: ApiScope, on: boolean) => {
    edited('scopes');
    setScopes((now) => (on ? [...new Set([...now, scope])] : now.filter((s) => s !== scope)));
  };
  const today = new Date();
  const tomorrow = new Date(today.getFullYear(), today.getMonth(), today.getDate() + 1);
  const minDay = `${tomorrow.getFullYear()}-${String(tomorrow.getMonth() + 1).padStart(2, '0')}-${String(tomorrow.getDate()).padStart(2, '0')}`;

  return (
    <form onSubmit={submit} noValidate className="mt-4 grid gap-5" aria-label="New API key">
      {create.isError && Object.keys(server.fields).length === 0 && (
        <Notice tone="error" title="The key was not made">
          {server.summary}
        </Notice>
      )}
      <TextField label="Name" name="name" value={name} maxLength={80} autoComplete="off" onChange={(e) => { setName(e.target.value); edited('name'); }}
        error={withFieldName('Name', errors.name)} hint="What uses it, e.g. “Quoting tool” or “Shop product pages”." />

      <fieldset>
        <legend className="text-sm font-bold text-ink-900">Kind</legend>
        <div className="mt-2 grid gap-2">
          {(['secret', 'publishable'] as const).map((k) => (
            <label key={k} className="flex items-start gap-2 text-sm">
              <input type="radio" name={`${id}-kind`} value={k} checked={kind === k} onChange={() => setKind(k)} className="mt-1 size-4 accent-ink-700" />
              <span>
                <span className="font-bold">{kindNames[k]}</span>{' '}
                <span className="text-ink-700">{k === 'secret' ? '— for your own servers; never put it in a web page.' : '— for web pages; works only from the origins you list.'}</span>
              </span>
            </label>
          ))}
        </div>
      </fieldset>

      <fieldset aria-describedby={errors.scopes ? `${id}-scopes-error` : undefined}>
        <legend className="text-sm font-bold text-ink-900">Scopes</legend>
        <div className="mt-2 grid gap-2">
          {apiScopes.map((s) => {
            const blocked = kind === 'publishable' && s === 'author';
            return (
              <label key={s} className={`flex items-start gap-2 text-sm ${blocked ? 'text-ink-600' : ''}`}>
                <input type="checkbox" checked={!blocked && scopes.includes(s)} disabled={blocked} onChange={(e) => toggleScope(s, e.target.checked)} className="mt-1 size-4 accent-ink-700" />
                <span>
                  <span className="font-bold">{scopeNames[s]}</span> <span className="text-ink-700">— {blocked ? 'not for a key that browsers can see' : scopeHints[s]}</span>
                </span>
              </label>
            );
          })}
        </div>
        {errors.scopes && <FieldError id={`${id}-scopes-error`}>{withFieldName('Scopes', errors.scopes)}</FieldError>}
      </fieldset>

      {kind === 'publishable' && (
        <div>
          <label htmlFor={`${id}-origins`} className="block text-sm font-bold text-ink-900">
            Allowed origins
          </label>
          <textarea id={`${id}-origins`} rows={3} value={origins} onChange={(e) => { setOrigins(e.target.value); edited('allowedOrigins'); }} className={`${inputClass} mt-1.5 font-mono text-sm`}
            aria-invalid={errors.allowedOrigins ? true : undefined}
            aria-describedby={`${id}-origins-hint${errors.allowedOrigins ? ` ${id}-origins-error` : ''}`}
            placeholder="https://shop.example.com" />
          {errors.allowedOrigins && <FieldError id={`${id}-origins-error`}>{withFieldName('Each origin', errors.allowedOrigins)}</FieldError>}
          <p id={`${id}-origins-hint`} className="mt-1.5 text-sm text-ink-700">One a line: scheme, host and port if any, no path.</p>
        </div>
      )}

      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label="Expires after (optional)" type="date" min={minDay} value={expiry} onChange={(e) => { setExpiry(e.target.value); edited('expiresAt'); }}
          error={withFieldName('The expiry', errors.expiresAt)} hint="Empty: until you revoke it." />
        <TextField label="Calls a minute (optional)" type="number" inputMode="numeric" min={1} max={100000} step={1} value={rate}
          onChange={(e) => { setRate(e.target.value); edited('ratePerMinute'); }} error={withFieldName('Calls a minute', errors.ratePerMinute)} hint="Empty: the standard 600." />
      </div>

      <div className="flex flex-wrap justify-end gap-3">
        <button type="button" className={secondaryButtonClass} onClick={onCancel}>
          Cancel
        </button>
        <button type="submit" className={primaryButtonClass} disabled={create.isPending}>
          {create.isPending ? 'Making the key…' : 'Make the key'}
        </button>
      </div>
    </form>
  );
}
