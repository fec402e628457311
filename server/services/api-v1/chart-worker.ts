import { parentPort } from 'node:worker_threads';
import { Window } from 'happy-dom';

/**
 * The chart worker's own globals: a DOM implementation's window, so React and Recharts find a
 * document. They live in this thread only; the server's main thread never sees a `window`
 * (libraries there decide browser or Node by it).
 */
const win = new Window({ width: 1280, height: 800, settings: { disableJavaScriptEvaluation: true, disableCSSFileLoading: true } });
// Recharts batches store notifications per animation frame; a frame here is the next turn.
win.requestAnimationFrame = ((cb: (t: number) => void) => setImmediate(() => cb(performance.now()))) as unknown as typeof win.requestAnimationFrame;
Object.assign(globalThis, { window: win, document: win.document, navigator: win.navigator });

const { installTextMeasure, renderPlot } = await import('./chart-plot-render');
installTextMeasure(win.document as unknown as Document);

export interface PlotRequest {
  id: number;
  job: import('./chart-plot-render').PlotJob;
}
export type PlotReply = { id: number; svg: string } | { id: number; error: string };

// One plot at a time: each has its own container, but nothing is gained by interleaving them.
let queue: Promise<void> = Promise.resolve();
parentPort!.on('message', (msg: PlotRequest) => {
  queue = queue.then(async () => {
    try {
      const svg = await renderPlot(win.document as unknown as Document, msg.job);
      parentPort!.postMessage({ id: msg.id, svg } satisfies PlotReply);
    } catch (err) {
      parentPort!.postMessage({ id: msg.id, error: err instanceof Error ? err.message : String(err) } satisfies PlotReply);
    }
  });
});
parentPort!.postMessage({ ready: true });
