import semver from 'semver';
import { engineProblemTypes } from '../../../shared/api/templates';
import { apiProblemTypes, type V1SolveResponse, type V1TemplateDetail, type V1TemplateList } from '../../../shared/api/v1';
import type { CompiledTemplate } from '../../../shared/mechanics/compile-template';
import { EngineError } from '../../../shared/mechanics/errors';
import { sweep, tornado } from '../../../shared/mechanics/sensitivity';
import type { SweepOutput, SweepRequest, TornadoOutput, TornadoRequest } from '../../../shared/mechanics/sensitivity-schema';
import { prepare, solve } from '../../../shared/mechanics/solve';
import { inputJsonSchema } from '../../../shared/spec/input-schema';
import type { TemplateSpec } from '../../../shared/spec/template-spec';
import { convertSolveResult } from '../../../shared/units/convert-result';
import type { Quantity } from '../../../shared/units/quantities';
import { fromDisplay, toDisplay, type UnitSystem } from '../../../shared/units/unit-systems';
import { HttpProblem } from '../../middleware/http-problem';
import { engineProblem } from '../templates/catalogue';
import { compareSemver, latestPerSlug, versionInfo, type StoredVersion, type TemplateStore } from '../templates/template-store';

export interface ResolvedVersion {
  row: StoredVersion;
  compiled: CompiledTemplate;
  quantities: Record<string, Quantity>;
}

const notFound = (type: string, title: string, detail: string) => new HttpProblem({ type, title, status: 404, detail });

/**
 * The catalogue as the public API sees it: versions chosen by semver range, inputs and
 * results in SI or US customary units. Version lists are read at most once a second per
 * template (a newly published version shows within that); compiled specs are kept by
 * content hash, since a published version never changes.
 */
export class V1Catalogue {
  private readonly compiled = new Map<string, ResolvedVersion>();
  private readonly versions = new Map<string, { at: number; rows: Promise<StoredVersion[]> }>();
  private published: { at: number; rows: Promise<StoredVersion[]> } | null = null;

  constructor(
    private readonly store: TemplateStore,
    private readonly cacheMs = 1000,
  ) {}

  private publishedOf(slug: string): Promise<StoredVersion[]> {
    const hit = this.versions.get(slug);
    if (hit && Date.now() - hit.at < this.cacheMs) return hit.rows;
    const rows = this.store.versionsOf(slug).then((all) => all.filter((r) => r.status === 'published').sort((a, b) => compareSemver(b.semver, a.semver)));
    this.versions.set(slug, { at: Date.now(), rows });
    rows.catch(() => this.versions.delete(slug));
    if (this.versions.size > 1000) this.versions.delete(this.versions.keys().next().value!);
    return rows;
  }

  /** The newest published version that the selector (exact or a range) admits; default the latest. */
  async resolve(slug: string, selector?: string): Promise<ResolvedVersion> {
    const rows = await this.publishedOf(slug);
    // An exact published version (as the handlers pass after resolving once) needs no range parsing.
    const exact = selector === undefined ? undefined : rows.find((r) => r.semver === selector);
    if (exact) return this.load(exact);
    if (selector !== undefined && semver.validRange(selector) === null) {
      throw new HttpProblem({
        type: apiProblemTypes.invalidRange,
        title: 'Invalid version',
        status: 422,
        detail: `'${selector}' is neither a version (1.0.0) nor a semver range (^1.0.0, ~1.2, >=1.1 <2).`,
        errors: [{ path: '/version', message: 'must be a version or a semver range' }],
      });
    }
    if (rows.length === 0) throw notFound(engineProblemTypes.unknownTemplate, 'Unknown template', `There is no published template '${slug}'.`);
    const chosen = selector === undefined ? rows[0]!.semver : semver.maxSatisfying(rows.map((r) => r.semver), selector);
    const row = rows.find((r) => r.semver === chosen);
    if (!row) {
      throw notFound(
        engineProblemTypes.unknownVersion,
        'Unknown version',
        `Template '${slug}' has no published version matching ${selector}; published: ${rows.map((r) => r.semver).join(', ')}.`,
      );
    }
    return this.load(row);
  }

  private load(row: StoredVersion): ResolvedVersion {
    const hit = this.compiled.get(row.contentHash);
    if (hit) return hit;
    const compiled = prepare(row.spec as TemplateSpec);
    const quantities = Object.fromEntries(compiled.inputs.map((i) => [i.key, i.quantity]));
    const loaded = { row, compiled, quantities };
    this.compiled.set(row.contentHash, loaded);
    return loaded;
  }

  async list(): Promise<V1TemplateList> {
    if (!this.published || Date.now() - this.published.at >= this.cacheMs) {
      this.published = { at: Date.now(), rows: this.store.publishedVersions() };
    }
    return {
      templates: latestPerSlug(await this.published.rows).map((row) => ({
        slug: row.slug,
        title: row.title,
        summary: row.summary,
        category: this.load(row).compiled.spec.category,
        latestVersion: row.semver,
        contentHash: row.contentHash,
      })),
    };
  }

  async detail(slug: string, selector?: string): Promise<V1TemplateDetail> {
    const { row, compiled } = await this.resolve(slug, selector);
    const all = (await this.store.versionsOf(slug)).filter((r) => r.status !== 'draft').sort((a, b) => compareSemver(b.semver, a.semver));
    const spec = compiled.spec;
    return {
      slug: row.slug,
      title: row.title,
      summary: row.summary,
      category: spec.category,
      version: row.semver,
      contentHash: row.contentHash,
      versions: all.map(versionInfo),
      inputSchema: inputJsonSchema(spec),
      defaults: Object.fromEntries(compiled.inputs.map((i) => [i.key, i.default])),
      inputs: compiled.inputs.map((i) => ({ key: i.key, label: i.label, quantity: i.quantity })),
      results: compiled.results.map((r) => ({ key: r.key, label: r.label, quantity: r.quantity ?? 'ratio' })),
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
    let out: SweepOutput;
    try {
      out = sweep(v.compiled, toSi(v, inputs, units), siRequest);
    } catch (err) {
      if (err instanceof EngineError) throw new HttpProblem(engineProblem(err.info, ['sweep']));
      throw err;
    }
    return { ...identity(v, units), sweep: units === 'SI' ? out : sweepInUnits(out, units) };
  }

  async sensitivity(slug: string, selector: string | undefined, inputs: Record<string, number>, request: TornadoRequest, units: UnitSystem) {
    const v = await this.resolve(slug, selector);
    let out: TornadoOutput;
    try {
      out = tornado(v.compiled, toSi(v, inputs, units), request);
    } catch (err) {
      if (err instanceof EngineError) throw new HttpProblem(engineProblem(err.info, ['tornado']));
      throw err;
    }
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
