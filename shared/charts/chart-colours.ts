// Series colours from the app's ink and signal families, told apart also by dash and marker
// shape, so a line is never known by its colour alone.
export const SERIES = [
  { stroke: '#20494d', dash: undefined, marker: 'circle' },
  { stroke: '#bb5215', dash: '6 3', marker: 'square' },
  { stroke: '#4f8c8f', dash: '2 3', marker: 'triangle' },
  { stroke: '#763416', dash: '10 4 2 4', marker: 'diamond' },
] as const;
