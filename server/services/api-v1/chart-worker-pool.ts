import { createRequire } from 'node:module';
import { pathToFileURL } from 'node:url';
import { Worker } from 'node:worker_threads';
import type { PlotJob } from './chart-plot-render';
import type { PlotReply } from './chart-worker';

const require = createRequire(import.meta.url);

/** tsx's ESM register API (its CommonJS twin resolves its own files wrongly from an eval'd worker). */
function tsxLoaderUrl(): string {
  const cjs = require.resolve('tsx/esm/api');
  return pathToFileURL(cjs.replace(/\.cjs$/, '.mjs')).href;
}

interface Pending {
  resolve: (svg: string) => void;
  reject: (err: Error) => void;
  timer: NodeJS.Timeout;
}

/**
 * One worker thread that draws plots (chart-worker.ts), started on the first chart and
 * restarted if it dies. The worker loads our TypeScript through tsx's loader, the same one the
 * server runs under.
 */
export class ChartWorkerPool {
  private worker: Worker | null = null;
  private ready: Promise<Worker> | null = null;
  private readonly pending = new Map<number, Pending>();
  private nextId = 1;

  constructor(private readonly timeoutMs = 15_000) {}

  private start(): Promise<Worker> {
    if (this.ready) return this.ready;
    const entry = new URL('./chart-worker.ts', import.meta.url).href;
    const source = `import(${JSON.stringify(tsxLoaderUrl())}).then((tsx) => { tsx.register(); return import(${JSON.stringify(entry)}); });`;
    const worker = new Worker(source, { eval: true, execArgv: [] });
    worker.unref();
    this.worker = worker;
    this.ready = new Promise<Worker>((resolve, reject) => {
      const failStart = (err: Error) => reject(err);
      worker.once('error', failStart);
      worker.on('message', (msg: PlotReply | { ready: true }) => {
        if ('ready' in msg) {
          worker.off('error', failStart);
          resolve(worker);
          return;
        }
        const p = this.pending.get(msg.id);
        if (!p) return;
        this.pending.delete(msg.id);
        clearTimeout(p.timer);
        if ('svg' in msg) p.resolve(msg.svg);
        else p.reject(new Error(`chart rendering failed: ${msg.error}`));
      });
    });
    const forget = (err: Error) => {
      if (this.worker !== worker) return;
      this.worker = null;
      this.ready = null;
      for (const [id, p] of this.pending) {
        clearTimeout(p.timer);
        p.reject(err);
        this.pending.delete(id);
      }
    };
    worker.on('error', forget);
    worker.on('exit', (code) => forget(new Error(`the chart worker stopped (exit code ${code})`)));
    return this.ready;
  }

  async warm(): Promise<void> {
    await this.start();
  }

  async render(job: PlotJob): Promise<string> {
    const worker = await this.start();
    const id = this.nextId++;
    return new Promise<string>((resolve, reject) => {
      const timer = setTimeout(() => {
        this.pending.delete(id);
        reject(new Error(`chart rendering took longer than ${this.timeoutMs} ms`));
      }, this.timeoutMs);
      timer.unref();
      this.pending.set(id, { resolve, reject, timer });
      worker.postMessage({ id, job });
    });
  }

  async close(): Promise<void> {
    const w = this.worker;
    this.worker = null;
    this.ready = null;
    if (w) await w.terminate();
  }
}
