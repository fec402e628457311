// Series colours from the app's ink and signal families, told apart also by dash and marker
// shape, so a line is never known by its colour alone.
export const SERIES = [
  { stroke: '#20494d', dash: undefined, marker: 'circle' },
  { stroke: '#bb5215', dash: '6 3', marker: 'square' },
  { stroke: '#4f8c8f', dash: '2 3', marker: 'triangle' },
  { stroke: '#763416', dash: '10 4 2 4', marker: 'diamond' },
] as const;

export type SeriesLook = (typeof SERIES)[number];

export const seriesLook = (index: number): SeriesLook => SERIES[index % SERIES.length]!;

/** The chart furniture, in the same theme values as the drawings (shared/drawing/palette.ts). */
export const CHART_INK = {
  grid: '#d5e6e6',
  axis: '#357174',
  label: '#20494d',
  text: '#142e32',
  bar: '#357174',
  gapFill: '#ffe6cf',
  gapEdge: '#dd6a1f',
  baseLine: '#dd6a1f',
  baseLabel: '#933f14',
} as const;
