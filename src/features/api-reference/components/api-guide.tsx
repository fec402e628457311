import type { ReactNode } from 'react';
import { problemTypes } from '../../../../shared/api/problem';
import { engineProblemTypes } from '../../../../shared/api/templates';
import { apiProblemTypes, v1Limits } from '../../../../shared/api/v1';

const scopes: { scope: string; opens: string }[] = [
  { scope: 'read', opens: 'the template list and one template with its input schema' },
  { scope: 'solve', opens: 'results, checks, member and joint forces' },
  { scope: 'sweep', opens: 'one input swept across a range' },
  { scope: 'sensitivity', opens: 'the tornado ranking of inputs' },
  { scope: 'author', opens: 'validating and solving specs you keep yourself (secret keys only)' },
];

const kib = (bytes: number) => `${Math.round(bytes / 1024)} kB`;

const limits: [string, string][] = [
  ['Requests per key', '600 a minute unless the key has its own figure, counted across every server'],
  ['Monthly calls', 'per organisation; 100 000 unless agreed otherwise'],
  ['Body', `${kib(v1Limits.bodyBytes)}; ${kib(v1Limits.specBodyBytes)} on /specs`],
  ['Sweep and tornado', `${v1Limits.sweepSteps} steps; ${v1Limits.tornadoInputs} inputs ranked`],
  ['Spec', `${v1Limits.specPoints} points, ${v1Limits.specJoints} joints, ${(v1Limits.specSolveMs / 1000).toFixed(0)} s to check and solve`],
];

const keyTypes = [apiProblemTypes.keyMissing, apiProblemTypes.keyInvalid, apiProblemTypes.keyRevoked, apiProblemTypes.keyExpired, apiProblemTypes.outOfScope, apiProblemTypes.wrongOrigin];
const inputTypes = [problemTypes.validation, engineProblemTypes.input, engineProblemTypes.geometry, engineProblemTypes.indeterminate, engineProblemTypes.unknownTemplate, engineProblemTypes.unknownVersion];
const limitTypes = [apiProblemTypes.rateLimited, apiProblemTypes.quotaExceeded];

function Section({ id, title, children }: { id: string; title: string; children: ReactNode }) {
  return (
    <section aria-labelledby={id} className="rounded-xl border border-ink-100 bg-paper-50 p-5">
      <h2 id={id} className="text-lg font-bold text-ink-900">
        {title}
      </h2>
      <div className="mt-2 grid gap-2 text-sm leading-relaxed text-ink-800">{children}</div>
    </section>
  );
}

const Code = ({ children }: { children: ReactNode }) => <code className="rounded bg-paper-200 px-1 py-0.5 font-mono text-[0.8rem] break-all text-ink-900">{children}</code>;

function TypeList({ types }: { types: readonly string[] }) {
  return (
    <ul className="flex flex-wrap gap-1.5">
      {types.map((t) => (
        <li key={t}>
          <Code>{t.replace('/problems/', '')}</Code>
        </li>
      ))}
    </ul>
  );
}

/**
 * The four things to know before the first call, in our words; the same headings as
 * docs/api.md (Keys, Limits, Errors), which has the curl example for every endpoint.
 */
export function ApiGuide() {
  return (
    <div className="grid gap-4 lg:grid-cols-2">
      <Section id="api-keys" title="Keys">
        <p>
          Send a key as <Code>Authorization: Bearer …</Code>. A <strong>secret key</strong> (<Code>pw_sk_…</Code>) is for your servers and never belongs in a
          web page; a <strong>publishable key</strong> (<Code>pw_pk_…</Code>) is for browsers and works only from the origins it lists.
        </p>
        <p>The owner of a supplier organisation creates, rotates and revokes keys under My organisation; the whole key is shown once, then only its prefix.</p>
      </Section>
      <Section id="api-scopes" title="Scopes">
        <ul className="grid gap-1">
          {scopes.map((s) => (
            <li key={s.scope}>
              <Code>{s.scope}</Code> — {s.opens}
            </li>
          ))}
        </ul>
      </Section>
      <Section id="api-limits" title="Limits">
        <dl className="grid gap-1 sm:grid-cols-[auto_1fr] sm:gap-x-4">
          {limits.map(([name, value]) => (
            <div key={name} className="contents">
              <dt className="font-semibold text-ink-900">{name}</dt>
              <dd>{value}</dd>
            </div>
          ))}
        </dl>
        <p>
          Over a limit the answer is <strong>429</strong> with <Code>Retry-After</Code> and <Code>RateLimit</Code> headers. Solve, sweep and sensitivity answers carry an{' '}
          <Code>ETag</Code>: send it back as <Code>If-None-Match</Code> and an unchanged answer is a 304 with no body.
        </p>
      </Section>
      <Section id="api-errors" title="Errors">
        <p>
          Every error is RFC 9457 problem details (<Code>application/problem+json</Code>): a stable <Code>type</Code>, a <Code>title</Code>, the{' '}
          <Code>status</Code>, a <Code>detail</Code> that says what to change, and for bad input an <Code>errors</Code> list with a JSON Pointer per field.
        </p>
        <p className="font-semibold text-ink-900">The key</p>
        <TypeList types={keyTypes} />
        <p className="font-semibold text-ink-900">The input, the template and the mechanism</p>
        <TypeList types={inputTypes} />
        <p className="font-semibold text-ink-900">The limits</p>
        <TypeList types={limitTypes} />
      </Section>
    </div>
  );
}
