import { createElement } from 'react';
import { flushSync } from 'react-dom';
import { createRoot } from 'react-dom/client';
import { SweepPlot } from '../../../shared/charts/sweep-plot';
import type { PreparedSweep } from '../../../shared/charts/sweep-rows';
import { TornadoPlot } from '../../../shared/charts/tornado-plot';
import type { PreparedTornado } from '../../../shared/charts/tornado-rows';

/**
 * Draws the shared Recharts plots in a DOM and returns the plot's <svg>. Runs only inside the
 * chart worker (chart-worker.ts), whose globals are a DOM implementation's window: Recharts 3
 * fills its store in effects, so rendering to a string on the server gives an empty surface.
 */
export type PlotJob =
  | { kind: 'sweep'; chart: PreparedSweep; width: number; height: number }
  | { kind: 'tornado'; chart: PreparedTornado; width: number; height: number };

const MEASUREMENT_SPAN_ID = 'recharts_measurement_span';
// Average advance of a sans-serif glyph as a share of the font size; close enough for Recharts
// to decide which tick labels fit, where a DOM without layout would measure every text as 0.
const AVERAGE_GLYPH = 0.56;

/** The span Recharts measures text with, given widths estimated from the text and font size. */
export function installTextMeasure(doc: Document): void {
  if (doc.getElementById(MEASUREMENT_SPAN_ID)) return;
  const span = doc.createElement('span');
  span.setAttribute('id', MEASUREMENT_SPAN_ID);
  span.setAttribute('aria-hidden', 'true');
  span.getBoundingClientRect = () => {
    const size = Number.parseFloat(span.style.fontSize) || 16;
    const width = (span.textContent ?? '').length * size * AVERAGE_GLYPH;
    return { x: 0, y: 0, top: 0, left: 0, width, height: size * 1.2, right: width, bottom: size * 1.2, toJSON: () => ({}) } as DOMRect;
  };
  doc.body.appendChild(span);
}

const nextFrame = () => new Promise<void>((resolve) => setImmediate(resolve));

function drawn(container: Element, job: PlotJob): boolean {
  if (!container.querySelector('svg.recharts-surface')) return false;
  if (job.kind === 'sweep') return container.querySelectorAll('.recharts-line').length >= job.chart.series.length;
  // Recharts draws no rectangle for a bar of zero length (an input that does not move the result).
  const bars = job.chart.rows.filter((r) => r.range[1] > r.range[0]).length;
  return container.querySelectorAll('.recharts-bar-rectangle').length >= bars;
}

/** Renders one plot in its own container and root; several may be in flight at once. */
export async function renderPlot(doc: Document, job: PlotJob): Promise<string> {
  const size = { width: job.width, height: job.height };
  const element =
    job.kind === 'sweep' ? createElement(SweepPlot, { chart: job.chart, size }) : createElement(TornadoPlot, { chart: job.chart, size, axisTitle: true });
  const container = doc.createElement('div');
  doc.body.appendChild(container);
  const root = createRoot(container);
  try {
    flushSync(() => root.render(element));
    // The store settles over a few frames (axes, then items, then ticks); done when the
    // plot's pieces are there and one more frame changes nothing.
    let last = '';
    for (let frame = 0; frame < 200; frame++) {
      await nextFrame();
      const now = container.innerHTML;
      if (now === last && drawn(container, job)) {
        return container.querySelector('svg.recharts-surface')!.outerHTML;
      }
      last = now;
    }
    throw new Error(`the ${job.kind} plot did not settle`);
  } finally {
    root.unmount();
    container.remove();
  }
}
