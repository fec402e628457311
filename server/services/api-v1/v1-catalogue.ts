import type { V1SolveResponse, V1TemplateDetail, V1TemplateList } from '../../../shared/api/v1';
import { sweep, tornado } from '../../../shared/mechanics/sensitivity';
import type { SweepOutput, SweepRequest, TornadoOutput, TornadoRequest } from '../../../shared/mechanics/sensitivity-schema';
import { solve } from '../../../shared/mechanics/solve';
import { convertSolveResult } from '../../../shared/units/convert-result';
import { fromDisplay, toDisplay, type UnitSystem } from '../../../shared/units/unit-systems';
import { HttpProblem } from '../../middleware/http-problem';
import { detailFields, engineProblem, TemplateCatalogue, withEngineProblems, type LoadedVersion } from '../templates/catalogue';
import type { TemplateStore } from '../templates/template-store';

/** A published version as the public API resolves it (the catalogue's loaded version). */
export type ResolvedVersion = LoadedVersion;

/**
 * The catalogue as the public API sees it: versions chosen by semver range, inputs and
 * results in SI or US customary units. Version choice, compilation, detail fields and engine
 * errors are the first-party catalogue's (templates/catalogue.ts); version lists are reused
 * for a second per template (a newly published version shows within that).
 */
export class V1Catalogue {
  private readonly base: TemplateCatalogue;

  constructor(store: TemplateStore, cacheMs = 1000) {
    this.base = new TemplateCatalogue(store, { versionCacheMs: cacheMs });
  }

  /** The newest published version that the selector (exact or a range) admits; default the latest. */
  resolve(slug: string, selector?: string): Promise<ResolvedVersion> {
    return this.base.resolve(slug, selector, { ranges: true });
  }

  async list(): Promise<V1TemplateList> {
    return {
      templates: (await this.base.latestPublished()).map((row) => ({
        slug: row.slug,
        title: row.title,
        summary: row.summary,
        category: this.base.load(row).spec.category,
        latestVersion: row.semver,
        contentHash: row.contentHash,
      })),
    };
  }

  async detail(slug: string, selector?: string): Promise<V1TemplateDetail> {
    const loaded = await this.resolve(slug, selector);
    const d = detailFields(loaded, await this.base.versionsOf(slug));
    return {
      ...d.head,
      inputSchema: d.inputSchema,
      defaults: d.defaults,
      inputs: loaded.compiled.inputs.map((i) => ({ key: i.key, label: i.label, quantity: i.quantity })),
      results: d.results,
    };
  }

  async solve(slug: string, selector: string | undefined, inputs: Record<string, number>, units: UnitSystem): Promise<V1SolveResponse> {
    const v = await this.resolve(slug, selector);
    const outcome = solve(v.compiled, toSi(v, inputs, units));
    if (!outcome.ok) throw new HttpProblem(engineProblem(outcome.error));
    return { ...identity(v, units), result: convertSolveResult(outcome, units, v.quantities) };
  }

  async sweep(slug: string, selector: string | undefined, inputs: Record<string, number>, request: SweepRequest, units: UnitSystem) {
    const v = await this.resolve(slug, selector);
    const q = v.quantities[request.input];
    const si = (x: number | undefined) => (x === undefined || !q ? x : fromDisplay(x, q, units));
    const siRequest = { ...request, from: si(request.from), to: si(request.to) };
    const out = withEngineProblems('sweep', () => sweep(v.compiled, toSi(v, inputs, units), siRequest));
    return { ...identity(v, units), sweep: units === 'SI' ? out : sweepInUnits(out, units) };
  }

  async sensitivity(slug: string, selector: string | undefined, inputs: Record<string, number>, request: TornadoRequest, units: UnitSystem) {
    const v = await this.resolve(slug, selector);
    const out = withEngineProblems('tornado', () => tornado(v.compiled, toSi(v, inputs, units), request));
    return { ...identity(v, units), tornado: units === 'SI' ? out : tornadoInUnits(out, units) };
  }
}

const identity = (v: ResolvedVersion, units: UnitSystem) => ({ slug: v.row.slug, version: v.row.semver, contentHash: v.row.contentHash, units });

/** US inputs to the engine's SI; choice inputs are codes, not amounts, and pass unchanged. */
function toSi(v: ResolvedVersion, inputs: Record<string, number>, units: UnitSystem): Record<string, number> {
  if (units === 'SI') return inputs;
  const choice = new Set(v.compiled.inputs.filter((i) => i.control === 'choice').map((i) => i.key));
  return Object.fromEntries(Object.entries(inputs).map(([k, x]) => [k, choice.has(k) || !v.quantities[k] ? x : fromDisplay(x, v.quantities[k], units)]));
}

function sweepInUnits(out: SweepOutput, units: UnitSystem): SweepOutput {
  const quantityOf = new Map(out.series.map((s) => [s.key, s.quantity]));
  return {
    ...out,
    steps: out.steps.map((s) => {
      const value = toDisplay(s.value, out.input.quantity, units);
      if (!s.ok) return { ...s, value };
      return {
        ...s,
        value,
        values: Object.fromEntries(Object.entries(s.values).map(([k, x]) => [k, x === null ? null : toDisplay(x, quantityOf.get(k) ?? 'ratio', units)])),
      };
    }),
  };
}

function tornadoInUnits(out: TornadoOutput, units: UnitSystem): TornadoOutput {
  const r = (x: number) => toDisplay(x, out.result.quantity, units);
  const rn = (x: number | null) => (x === null ? null : r(x));
  return {
    ...out,
    base: r(out.base),
    bars: out.bars.map((b) => ({
      ...b,
      low: { ...b.low, input: toDisplay(b.low.input, b.quantity, units), value: rn(b.low.value) },
      high: { ...b.high, input: toDisplay(b.high.input, b.quantity, units), value: rn(b.high.value) },
      // A swing is a difference of two results: a scale factor only, no offset to undo.
      swing: Math.abs(r(b.swing) - r(0)),
    })),
  };
}
