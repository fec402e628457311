/**
 * Drawing colours, the same values as the app's theme (tailwind.config.ts): slate-teal ink
 * for structure and text, warm paper for the ground, and the signal orange kept for forces
 * alone, so that in a drawing as on a screen orange means "a force acts here". Colour never
 * carries meaning by itself: every force also has an arrow and a label, every member state a
 * letter.
 */
export const PALETTE = {
  paper: '#fbfaf6',
  paperShade: '#f5f2ea',
  paperLine: '#d8cfba',
  ink: '#142e32',
  inkStrong: '#0c1e21',
  inkSoft: '#357174',
  inkMuted: '#7aaeb0',
  partFill: '#d5e6e6',
  partEdge: '#20494d',
  memberFill: '#eef5f5',
  highlight: '#abcdce',
  signal: '#dd6a1f',
  signalStrong: '#bb5215',
  signalPale: '#ffe6cf',
} as const;

export const FONT_FAMILY = 'Manrope, sans-serif';
