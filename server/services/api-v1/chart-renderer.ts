import { LRUCache } from 'lru-cache';
import type { SweepOutput, TornadoOutput } from '../../../shared/mechanics/sensitivity-schema';
import { sweepSvg, tornadoSvg, type ChartIdentity } from './chart-svg';
import { ChartWorkerPool } from './chart-worker-pool';

/** Bump when the look of a chart document changes, so an old ETag stops matching. */
export const CHART_LAYOUT_REVISION = 1;

/**
 * SVG answers of the public API. A chart of a published version is a pure function of the
 * spec and the request, so documents are kept by their ETag: a product page that shows the
 * same chart to every visitor costs one render.
 */
export class ChartRenderer {
  private readonly cache: LRUCache<string, Promise<string>>;

  constructor(
    private readonly pool = new ChartWorkerPool(),
    cacheSize = 200,
  ) {
    this.cache = new LRUCache({ max: cacheSize });
  }

  /** Requests for one chart while it is being drawn share the drawing; a failed one is forgotten. */
  private remember(key: string, make: () => Promise<string>): Promise<string> {
    const hit = this.cache.get(key);
    if (hit) return hit;
    const made = make();
    this.cache.set(key, made);
    made.catch(() => this.cache.delete(key));
    return made;
  }

  /** The chart under `key`; its data is computed only when the chart is not kept already. */
  sweep(key: string, id: ChartIdentity, data: () => Promise<SweepOutput>): Promise<string> {
    return this.remember(key, async () => sweepSvg(this.pool, id, await data()));
  }

  tornado(key: string, id: ChartIdentity, data: () => Promise<TornadoOutput>): Promise<string> {
    return this.remember(key, async () => tornadoSvg(this.pool, id, await data()));
  }

  /** Starts the worker ahead of the first chart (it takes a few seconds to load). */
  warm(): Promise<void> {
    return this.pool.warm();
  }

  close(): Promise<void> {
    return this.pool.close();
  }
}

/** One per process: the worker thread and the cache serve every app instance alike. */
export const chartRenderer = new ChartRenderer();
