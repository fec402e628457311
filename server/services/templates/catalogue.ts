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
import { thumbnailSvg } from '../../../shared/drawing/thumbnail';
import type { CompiledTemplate } from '../../../shared/mechanics/compile-template';
import { EngineError, type EngineErrorInfo } from '../../../shared/mechanics/errors';
import { sweep, tornado } from '../../../shared/mechanics/sensitivity';
import type { SweepRequest, TornadoRequest } from '../../../shared/mechanics/sensitivity-schema';
import { prepare, solve } from '../../../shared/mechanics/solve';
import { inputJsonSchema } from '../../../shared/spec/input-schema';
import type { TemplateSpec } from '../../../shared/spec/template-spec';
import { HttpProblem } from '../../middleware/http-problem';
import { compareSemver, latestPerSlug, versionInfo, type StoredVersion, type TemplateStore } from './template-store';

/** A published version ready to serve: its spec compiled once (versions are immutable). */
interface Loaded {
  row: StoredVersion;
  compiled: CompiledTemplate;
  spec: TemplateSpec;
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

/**
 * The published templates as the calculator and the API see them. Compiled specs and
 * thumbnails are cached by content hash: a published version never changes, so neither can
 * anything derived from it.
 */
export class TemplateCatalogue {
  private readonly byHash = new Map<string, Loaded>();
  private readonly thumbnails = new Map<string, string>();

  constructor(private readonly store: TemplateStore) {}

  private load(row: StoredVersion): Loaded {
    const hit = this.byHash.get(row.contentHash);
    if (hit) return hit;
    const compiled = prepare(row.spec as TemplateSpec);
    const loaded = { row, compiled, spec: compiled.spec };
    this.byHash.set(row.contentHash, loaded);
    return loaded;
  }

  /** The version asked for (exact), or the latest published one. */
  async resolve(slug: string, version?: string): Promise<Loaded> {
    const rows = (await this.store.versionsOf(slug)).filter((r) => r.status === 'published');
    if (rows.length === 0) throw notFound(engineProblemTypes.unknownTemplate, 'Unknown template', `There is no published template '${slug}'.`);
    rows.sort((a, b) => compareSemver(b.semver, a.semver));
    const row = version === undefined ? rows[0]! : rows.find((r) => r.semver === version);
    if (!row) {
      throw notFound(
        engineProblemTypes.unknownVersion,
        'Unknown version',
        `Template '${slug}' has no published version ${version}; published: ${rows.map((r) => r.semver).join(', ')}.`,
      );
    }
    return this.load(row);
  }

  async list(): Promise<TemplateList> {
    return {
      templates: latestPerSlug(await this.store.publishedVersions()).map((row) => {
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
    const { row, spec, compiled } = await this.resolve(slug, version);
    const all = (await this.store.versionsOf(slug)).filter((r) => r.status !== 'draft').sort((a, b) => compareSemver(b.semver, a.semver));
    return {
      slug: row.slug,
      title: row.title,
      summary: row.summary,
      category: spec.category,
      version: row.semver,
      contentHash: row.contentHash,
      versions: all.map(versionInfo),
      spec,
      inputSchema: inputJsonSchema(spec),
      defaults: Object.fromEntries(compiled.inputs.map((i) => [i.key, i.default])),
      results: compiled.results.map((r) => ({ key: r.key, label: r.label, quantity: r.quantity ?? 'ratio' })),
      validatorUrl: `/api/templates/${encodeURIComponent(row.slug)}/versions/${row.semver}/validator.js`,
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
    try {
      return { slug: row.slug, version: row.semver, contentHash: row.contentHash, sweep: sweep(compiled, inputs, request) };
    } catch (err) {
      if (err instanceof EngineError) throw new HttpProblem(engineProblem(err.info, ['sweep']));
      throw err;
    }
  }

  async sensitivity(slug: string, version: string | undefined, inputs: Record<string, number>, request: TornadoRequest): Promise<SensitivityResponse> {
    const { row, compiled } = await this.resolve(slug, version);
    try {
      return { slug: row.slug, version: row.semver, contentHash: row.contentHash, tornado: tornado(compiled, inputs, request) };
    } catch (err) {
      if (err instanceof EngineError) throw new HttpProblem(engineProblem(err.info, ['tornado']));
      throw err;
    }
  }

  async validatorScript(slug: string, version: string): Promise<string> {
    const { row } = await this.resolve(slug, version);
    if (!row.validatorScript) {
      throw notFound(engineProblemTypes.unknownVersion, 'No validator', `Version ${version} of '${slug}' was stored without an input validator.`);
    }
    return row.validatorScript;
  }
}
