import semver from 'semver';
import type { Problem } from '../../../shared/api/problem';
import { toJsonPointer } from '../../../shared/api/problem';
import {
  engineProblemTypes,
  type SensitivityResponse,
  type SolveResponse,
  type SweepResponse,
  type TemplateDetail,
  type TemplateList,
} from '../../../shared/api/templates';
import { apiProblemTypes } from '../../../shared/api/v1';
import { thumbnailSvg } from '../../../shared/drawing/thumbnail';
import type { CompiledTemplate } from '../../../shared/mechanics/compile-template';
import { EngineError, type EngineErrorInfo } from '../../../shared/mechanics/errors';
import { sweep, tornado } from '../../../shared/mechanics/sensitivity';
import type { SweepRequest, TornadoRequest } from '../../../shared/mechanics/sensitivity-schema';
import { prepare, solve } from '../../../shared/mechanics/solve';
import { inputJsonSchema } from '../../../shared/spec/input-schema';
import type { TemplateSpec } from '../../../shared/spec/template-spec';
import type { Quantity } from '../../../shared/units/quantities';
import { HttpProblem } from '../../middleware/http-problem';
import { compareSemver, latestPerSlug, versionInfo, type StoredVersion, type TemplateStore } from './template-store';

/** A published version ready to serve: its spec compiled once (versions are immutable). */
export interface LoadedVersion {
  row: StoredVersion;
  compiled: CompiledTemplate;
  spec: TemplateSpec;
  /** Each input's quantity, for unit conversion. */
  quantities: Record<string, Quantity>;
}

export interface CatalogueOptions {
  /**
   * How long a template's version list (and the list of latest versions) is reused: 0 reads
   * it for every request; the public API keeps it a second, so a new version shows within one.
   */
  versionCacheMs?: number;
}

const ENGINE_TITLES: Record<EngineErrorInfo['kind'], string> = {
  input: 'Invalid input',
  expression: 'An expression cannot be evaluated',
  geometry: 'The geometry cannot close',
  parallel: 'The geometry cannot close',
  indeterminate: 'Statically indeterminate',
  mechanism: 'Not in equilibrium',
  'dead-centre': 'At a dead centre',
  numeric: 'Not a finite number',
};

/**
 * An engine outcome that is about the user's inputs (out of range, a geometry that cannot be
 * built, a dead centre) is a 422 problem: `detail` carries the engine's sentence, `engineError`
 * the structured reason, and `errors` points at the field when the engine names one.
 */
export function engineProblem(info: EngineErrorInfo, prefix: string[] = []): Problem {
  const path = info.path ?? [];
  const fieldPath = path[0] === 'inputs' ? path : prefix.length && info.kind === 'input' ? [...prefix, ...path] : null;
  return {
    type: engineProblemTypes[info.kind],
    title: ENGINE_TITLES[info.kind],
    status: 422,
    detail: info.message,
    engineError: info,
    ...(fieldPath ? { errors: [{ path: toJsonPointer(fieldPath), message: info.message }] } : {}),
  };
}

const notFound = (type: string, title: string, detail: string): HttpProblem => new HttpProblem({ type, title, status: 404, detail });

/** Runs an engine analysis; an engine error about the request becomes a 422 problem under `prefix`. */
export function withEngineProblems<T>(prefix: string, run: () => T): T {
  try {
    return run();
  } catch (err) {
    if (err instanceof EngineError) throw new HttpProblem(engineProblem(err.info, [prefix]));
    throw err;
  }
}

/** The fields a template's detail has in both APIs, from the version chosen and its siblings. */
export function detailFields(loaded: LoadedVersion, versions: StoredVersion[]) {
  const { row, spec, compiled } = loaded;
  return {
    head: { slug: row.slug, title: row.title, summary: row.summary, category: spec.category, version: row.semver, contentHash: row.contentHash, versions: versions.map(versionInfo) },
    inputSchema: inputJsonSchema(spec),
    defaults: Object.fromEntries(compiled.inputs.map((i) => [i.key, i.default])),
    results: compiled.results.map((r) => ({ key: r.key, label: r.label, quantity: r.quantity ?? 'ratio' })),
  };
}

/**
 * The published templates as the calculator and the API see them. Compiled specs and
 * thumbnails are cached by content hash: a published version never changes, so neither can
 * anything derived from it. Version choice, detail fields and engine errors live here once;
 * the public API's catalogue (api-v1/v1-catalogue.ts) adds semver ranges and units on top.
 */
export class TemplateCatalogue {
  private readonly byHash = new Map<string, LoadedVersion>();
  private readonly thumbnails = new Map<string, string>();
  private readonly versionCacheMs: number;
  private readonly versions = new Map<string, { at: number; rows: Promise<StoredVersion[]> }>();
  private latest: { at: number; rows: Promise<StoredVersion[]> } | null = null;

  constructor(
    private readonly store: TemplateStore,
    options: CatalogueOptions = {},
  ) {
    this.versionCacheMs = options.versionCacheMs ?? 0;
  }

  load(row: StoredVersion): LoadedVersion {
    const hit = this.byHash.get(row.contentHash);
    if (hit) return hit;
    const compiled = prepare(row.spec as TemplateSpec);
    const quantities = Object.fromEntries(compiled.inputs.map((i) => [i.key, i.quantity]));
    const loaded = { row, compiled, spec: compiled.spec, quantities };
    this.byHash.set(row.contentHash, loaded);
    return loaded;
  }

  /** Every version of a template but drafts, newest first (cached as the options say). */
  versionsOf(slug: string): Promise<StoredVersion[]> {
    const hit = this.versions.get(slug);
    if (hit && Date.now() - hit.at < this.versionCacheMs) return hit.rows;
    const rows = this.store.versionsOf(slug).then((all) => all.filter((r) => r.status !== 'draft').sort((a, b) => compareSemver(b.semver, a.semver)));
    if (this.versionCacheMs > 0) {
      this.versions.set(slug, { at: Date.now(), rows });
      rows.catch(() => this.versions.delete(slug));
      if (this.versions.size > 1000) this.versions.delete(this.versions.keys().next().value!);
    }
    return rows;
  }

  /** The latest published version of every template. */
  async latestPublished(): Promise<StoredVersion[]> {
    if (this.latest && Date.now() - this.latest.at < this.versionCacheMs) return this.latest.rows;
    const rows = this.store.publishedVersions().then(latestPerSlug);
    if (this.versionCacheMs > 0) {
      this.latest = { at: Date.now(), rows };
      rows.catch(() => (this.latest = null));
    }
    return rows;
  }

  /**
   * The published version asked for: exact, or with `ranges` the newest a semver range admits;
   * the latest when none is named. An exact match needs no range parsing.
   */
  async resolve(slug: string, selector?: string, options: { ranges?: boolean } = {}): Promise<LoadedVersion> {
    const rows = (await this.versionsOf(slug)).filter((r) => r.status === 'published');
    const exact = selector === undefined ? rows[0] : rows.find((r) => r.semver === selector);
    if (exact) return this.load(exact);
    if (options.ranges && selector !== undefined && semver.validRange(selector) === null) {
      throw new HttpProblem({
        type: apiProblemTypes.invalidRange,
        title: 'Invalid version',
        status: 422,
        detail: `'${selector}' is neither a version (1.0.0) nor a semver range (^1.0.0, ~1.2, >=1.1 <2).`,
        errors: [{ path: '/version', message: 'must be a version or a semver range' }],
      });
    }
    if (rows.length === 0) throw notFound(engineProblemTypes.unknownTemplate, 'Unknown template', `There is no published template '${slug}'.`);
    const chosen = options.ranges ? semver.maxSatisfying(rows.map((r) => r.semver), selector!) : null;
    const row = rows.find((r) => r.semver === chosen);
    if (!row) {
      throw notFound(
        engineProblemTypes.unknownVersion,
        'Unknown version',
        `Template '${slug}' has no published version ${options.ranges ? 'matching ' : ''}${selector}; published: ${rows.map((r) => r.semver).join(', ')}.`,
      );
    }
    return this.load(row);
  }

  async list(): Promise<TemplateList> {
    return {
      templates: (await this.latestPublished()).map((row) => {
        const { spec } = this.load(row);
        return {
          slug: row.slug,
          title: row.title,
          summary: row.summary,
          category: spec.category,
          version: row.semver,
          contentHash: row.contentHash,
          thumbnailSvg: this.thumbnail(row),
        };
      }),
    };
  }

  private thumbnail(row: StoredVersion): string {
    const hit = this.thumbnails.get(row.contentHash);
    if (hit !== undefined) return hit;
    const { compiled, spec } = this.load(row);
    const result = solve(compiled);
    // A built-in that fails at its defaults is caught by its tests; never fail the list for it.
    const svg = result.ok ? thumbnailSvg(spec, result) : '';
    this.thumbnails.set(row.contentHash, svg);
    return svg;
  }

  async detail(slug: string, version?: string): Promise<TemplateDetail> {
    const loaded = await this.resolve(slug, version);
    const d = detailFields(loaded, await this.versionsOf(slug));
    return {
      ...d.head,
      spec: loaded.spec,
      inputSchema: d.inputSchema,
      defaults: d.defaults,
      results: d.results,
      validatorUrl: `/api/templates/${encodeURIComponent(loaded.row.slug)}/versions/${loaded.row.semver}/validator.js`,
    };
  }

  async solve(slug: string, version: string | undefined, inputs: Record<string, number>): Promise<SolveResponse> {
    const { row, compiled } = await this.resolve(slug, version);
    const outcome = solve(compiled, inputs);
    if (!outcome.ok) throw new HttpProblem(engineProblem(outcome.error));
    return { slug: row.slug, version: row.semver, contentHash: row.contentHash, result: outcome };
  }

  async sweep(slug: string, version: string | undefined, inputs: Record<string, number>, request: SweepRequest): Promise<SweepResponse> {
    const { row, compiled } = await this.resolve(slug, version);
    return { slug: row.slug, version: row.semver, contentHash: row.contentHash, sweep: withEngineProblems('sweep', () => sweep(compiled, inputs, request)) };
  }

  async sensitivity(slug: string, version: string | undefined, inputs: Record<string, number>, request: TornadoRequest): Promise<SensitivityResponse> {
    const { row, compiled } = await this.resolve(slug, version);
    return { slug: row.slug, version: row.semver, contentHash: row.contentHash, tornado: withEngineProblems('tornado', () => tornado(compiled, inputs, request)) };
  }

  async validatorScript(slug: string, version: string): Promise<string> {
    const { row } = await this.resolve(slug, version);
    if (!row.validatorScript) {
      throw notFound(engineProblemTypes.unknownVersion, 'No validator', `Version ${version} of '${slug}' was stored without an input validator.`);
    }
    return row.validatorScript;
  }
}
