import type { RJSFSchema } from '@rjsf/utils';
import { lazy, Suspense, useMemo, useRef, useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import { forcesTextAlternative } from '../../../shared/drawing/forces-text';
import { freeBodySvg } from '../../../shared/drawing/free-body-svg';
import { mechanismSvg } from '../../../shared/drawing/mechanism-svg';
import { formatNumber } from '../../../shared/units/format';
import { toDisplay, unitOf } from '../../../shared/units/unit-systems';
import { UnitSwitch } from '../../components/unit-switch';
import { useTemplate, type TemplateDetail } from '../../features/calculator/api/get-template';
import { CautionsPanel } from '../../features/calculator/components/cautions-panel';
import { ChecksList } from '../../features/calculator/components/checks-list';
import { DrawingPanel, type DrawingView } from '../../features/calculator/components/drawing-panel';
import { ReferencesList } from '../../features/calculator/components/references-list';
import { resultRows } from '../../features/calculator/components/result-rows';
import { resultsCsv } from '../../features/calculator/components/results-csv';
import { ResultsTable } from '../../features/calculator/components/results-table';
import { SolveStatus } from '../../features/calculator/components/solve-status';
import { VerificationBlock } from '../../features/calculator/components/verification-block';
import type { FormValues } from '../../features/calculator/form/engine-units-validator';
import { InputForm } from '../../features/calculator/form/input-form';
import { useCalculatorInputs } from '../../features/calculator/hooks/use-calculator-inputs';
import { useInputValidator } from '../../features/calculator/hooks/use-input-validator';
import { useLiveSolve } from '../../features/calculator/hooks/use-live-solve';
import { ApiError } from '../../lib/api-client';
import { downloadCsv } from '../../lib/csv';
import { useNearViewport } from '../../lib/use-near-viewport';

// Recharts is large: the charts load after the calculator is on screen.
const ChartsPanel = lazy(() => import('../../features/charts/components/charts-panel'));

const toolButton =
  'rounded-lg border border-ink-300 bg-paper-50 px-3 py-1.5 text-sm font-bold text-ink-800 hover:bg-ink-50 disabled:opacity-50';

function Section({ id, title, children, className = '' }: { id: string; title: string; children: React.ReactNode; className?: string }) {
  return (
    <section aria-labelledby={id} className={`rounded-2xl border border-ink-100 bg-paper-50/60 p-4 sm:p-5 print:border-0 print:p-0 ${className}`}>
      <h2 id={id} className="text-lg font-extrabold tracking-tight text-ink-950 print:text-base">{title}</h2>
      <div className="mt-3">{children}</div>
    </section>
  );
}

export function CalculatorRoute() {
  const { slug = '', version } = useParams();
  const template = useTemplate(slug, version);
  if (template.isPending) {
    return <p role="status" className="mx-auto max-w-page px-4 py-10 text-ink-700 sm:px-6">Loading the calculator…</p>;
  }
  if (template.isError) {
    const e = template.error;
    return (
      <div className="mx-auto max-w-page px-4 py-10 sm:px-6">
        <title>Template not available · Pinwork</title>
        <h1 className="text-3xl font-extrabold text-ink-950">This template is not available</h1>
        <p role="alert" className="mt-4 max-w-2xl rounded-xl border border-verdict-fail/40 bg-paper-50 p-5 text-ink-900">
          {e instanceof ApiError ? e.problem.detail ?? e.message : 'The request failed.'}
        </p>
        <Link to="/templates" className="mt-6 inline-block rounded-lg bg-ink-800 px-5 py-3 text-sm font-bold text-paper-50 hover:bg-ink-700">
          Back to the library
        </Link>
      </div>
    );
  }
  return <Calculator key={`${template.data.slug}@${template.data.version}`} detail={template.data} pinned={version !== undefined} />;
}

function Calculator({ detail, pinned }: { detail: TemplateDetail; pinned: boolean }) {
  const { spec } = detail;
  const schema = detail.inputSchema as RJSFSchema;
  const state = useCalculatorInputs(spec.inputs, detail.defaults);
  const { system } = state;
  const { validator, failed: validatorFailed } = useInputValidator(detail.validatorUrl, detail.contentHash, schema, spec.inputs, system);
  const clientErrors = useMemo(() => validator.validateFormData(state.display, schema).errors.length, [validator, state.display, schema]);
  const inputsValid = clientErrors === 0 && Object.values(state.engine).every((v) => typeof v === 'number');
  const live = useLiveSolve(detail.slug, detail.version, state.engineNumbers, inputsValid);

  const [changed, setChanged] = useState<string | undefined>(undefined);
  const previous = useRef<FormValues>(state.display);
  const onChange = (values: FormValues) => {
    const key = spec.inputs.find((i) => values[i.key] !== previous.current[i.key])?.key;
    if (key) setChanged(key);
    previous.current = values;
    state.setDisplayValues(values);
  };

  const [view, setView] = useState('mechanism');
  // The charts (and their chunk, and their sweep and tornado requests) wait until scrolled near.
  const [chartsRef, chartsNear] = useNearViewport<HTMLDivElement>();
  const [copied, setCopied] = useState(false);
  const result = live.result;
  const partLabel = (id: string) => spec.parts.find((p) => p.id === id)?.label ?? id;

  const views: DrawingView[] = useMemo(() => {
    if (!result) return [];
    const out: DrawingView[] = [
      { id: 'mechanism', label: 'Mechanism', svg: mechanismSvg(spec, result, { unitSystem: system, highlightInput: changed, idPrefix: 'calc-mech' }) },
    ];
    for (const part of spec.parts) {
      out.push({ id: part.id, label: `Free body: ${part.label}`, svg: freeBodySvg(spec, result, part.id, { unitSystem: system, idPrefix: `calc-fb-${part.id}` }) });
    }
    return out;
  }, [spec, result, system, changed]);
  const text = useMemo(() => (result ? forcesTextAlternative(spec, result, system) : null), [spec, result, system]);
  const rows = useMemo(() => (result ? resultRows(result, system) : []), [result, system]);
  const chartResults = detail.results;

  const copyLink = async () => {
    try {
      await navigator.clipboard.writeText(window.location.href);
      setCopied(true);
      setTimeout(() => setCopied(false), 2500);
    } catch {
      setCopied(false);
    }
  };

  const latest = detail.versions.filter((v) => v.status === 'published').map((v) => v.version);

  return (
    <div className="mx-auto max-w-page px-4 py-6 sm:px-6 sm:py-8 print:max-w-none print:p-0">
      <title>{`${detail.title} · Pinwork calculator`}</title>
      <nav aria-label="Breadcrumb" className="text-sm print:hidden">
        <ol className="flex flex-wrap items-center gap-1.5 text-ink-700">
          <li><Link to="/templates" className="font-semibold underline-offset-2 hover:underline">Library</Link></li>
          <li aria-hidden="true">/</li>
          <li aria-current="page" className="font-semibold text-ink-900">{detail.title}</li>
        </ol>
      </nav>

      <header className="mt-3 flex flex-wrap items-end justify-between gap-4 print:mt-0">
        <div className="max-w-3xl">
          <p className="text-xs font-bold tracking-wide text-signal-700 uppercase">
            {spec.category} · version {detail.version}{pinned ? '' : ' (latest)'}
          </p>
          <h1 className="mt-1 text-3xl font-extrabold tracking-tight text-ink-950 sm:text-4xl print:text-2xl">{detail.title}</h1>
          <p className="mt-2 text-base leading-relaxed text-ink-800 print:text-sm">{detail.summary}</p>
        </div>
        <div className="flex flex-wrap items-center gap-2 print:hidden">
          <UnitSwitch value={system} onChange={state.setSystem} />
        </div>
      </header>

      <div className="mt-4 flex flex-wrap items-center gap-2 print:hidden">
        <button type="button" className={toolButton} onClick={() => { state.reset(); setChanged(undefined); }}>Reset to defaults</button>
        <button type="button" className={toolButton} onClick={() => void copyLink()}>Copy link</button>
        <button type="button" className={toolButton} disabled={!result}
          onClick={() => result && downloadCsv(`${detail.slug}-${detail.version}-results.csv`, resultsCsv(detail, spec.inputs, result, system))}>
          Download results CSV
        </button>
        <button type="button" className={toolButton} onClick={() => window.print()}>Print sheet</button>
        {latest.length > 1 && (
          <nav aria-label="Versions" className="flex flex-wrap items-center gap-1.5 text-sm">
            <span className="font-semibold text-ink-700">Versions:</span>
            {latest.map((v) => (
              <Link key={v} to={`/templates/${detail.slug}/v/${v}`} aria-current={v === detail.version ? 'page' : undefined}
                className={`rounded px-1.5 py-0.5 font-semibold ${v === detail.version ? 'bg-ink-100 text-ink-950' : 'text-ink-700 underline'}`}>{v}</Link>
            ))}
          </nav>
        )}
        <span role="status" className="text-sm font-semibold text-verdict-pass">{copied ? 'Link copied.' : ''}</span>
      </div>

      <div className="mt-6 grid gap-6 lg:grid-cols-[22rem_minmax(0,1fr)] print:mt-3 print:block">
        <Section id="inputs-heading" title="Inputs" className="print:hidden lg:self-start">
          <InputForm
            schema={schema}
            inputs={spec.inputs}
            system={system}
            values={state.display}
            onChange={onChange}
            validator={validator}
            serverErrors={live.problem?.fieldErrors ?? {}}
          />
          {validatorFailed && (
            <p className="mt-4 text-xs text-ink-700">Checking as you type is not available right now; the server still checks every value.</p>
          )}
        </Section>

        <PrintedInputs detail={detail} values={state.engine} system={system} />

        <div className="grid min-w-0 gap-6 print:gap-3">
          <SolveStatus updating={live.updating} stale={live.stale} hasResult={result !== null} problem={live.problem} invalidInputs={!inputsValid} solvedFor={live.settledKey} />
          {result && (
            <Section id="drawing-heading" title="Drawing" className="print:break-inside-avoid">
              <DrawingPanel views={views} selected={view} onSelect={setView} text={text} stale={live.stale} />
            </Section>
          )}
          <div className="grid gap-6 xl:grid-cols-[minmax(0,1fr)_18rem] print:grid-cols-[minmax(0,1fr)_14rem] print:gap-3">
            <Section id="results-heading" title="Results">
              {result ? (
                <div className="grid gap-5">
                  <ResultsTable rows={rows} stale={live.stale} />
                  {result.checks.length > 0 && (
                    <div>
                      <h3 className="mb-2 text-sm font-extrabold tracking-wide text-ink-700 uppercase">Design checks</h3>
                      <ChecksList checks={result.checks} />
                    </div>
                  )}
                  {result.warnings.length > 0 && (
                    <ul className="grid gap-1 text-sm text-verdict-warn">
                      {result.warnings.map((w) => <li key={w}><span aria-hidden="true">! </span>{w}</li>)}
                    </ul>
                  )}
                </div>
              ) : (
                <p className="text-sm text-ink-700">{live.problem ? 'No results: see the message above.' : 'Solving…'}</p>
              )}
            </Section>
            <div className="grid content-start gap-6 print:gap-3">
              <CautionsPanel cautions={spec.cautions} />
              {result && (
                <Section id="verification-heading" title="Do the numbers close?">
                  <VerificationBlock verification={result.verification} partLabel={partLabel} />
                </Section>
              )}
            </div>
          </div>
        </div>
      </div>

      <Section id="charts-heading" title="Sensitivity" className="mt-6 print:hidden">
        <div ref={chartsRef}>
        <Suspense fallback={<p role="status" className="text-sm text-ink-700">Loading the charts…</p>}>
          {!chartsNear ? (
            <p className="text-sm text-ink-700">The sweep and sensitivity charts load when you scroll to them.</p>
          ) : inputsValid && live.settledValid ? (
            <ChartsPanel slug={detail.slug} version={detail.version} inputs={live.settledInputs} system={system}
              specInputs={spec.inputs} results={chartResults} />
          ) : (
            <p className="text-sm text-ink-700">Correct the marked input to draw the charts.</p>
          )}
        </Suspense>
        </div>
      </Section>

      <Section id="references-heading" title="Reference cases" className="mt-6 print:hidden">
        <ReferencesList references={spec.references} />
      </Section>
    </div>
  );
}

/** On paper the form is replaced by a plain list of the values solved. */
function PrintedInputs({ detail, values, system }: { detail: TemplateDetail; values: FormValues; system: 'SI' | 'US' }) {
  return (
    <section aria-label="Inputs as printed" className="hidden print:mb-3 print:block">
      <h2 className="text-base font-extrabold">Inputs</h2>
      <dl className="mt-1 grid grid-cols-3 gap-x-4 gap-y-0.5 text-xs">
        {detail.spec.inputs.map((i) => {
          const v = values[i.key];
          return (
            <div key={i.key} className="flex justify-between gap-2 border-b border-ink-100">
              <dt>{i.label}</dt>
              <dd className="font-bold tabular-nums">{typeof v === 'number' ? `${formatNumber(toDisplay(v, i.quantity, system))} ${unitOf(i.quantity, system)}` : '—'}</dd>
            </div>
          );
        })}
      </dl>
    </section>
  );
}
