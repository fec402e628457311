/**
 * The only functions an expression may call (besides the solved-quantity accessors, which
 * the compiler resolves per phase). Angles are degrees in the *d helpers, radians in the
 * plain ones, as on an engineer's calculator.
 */
const D = Math.PI / 180;

type Fn = (...args: number[]) => number;

interface FnDef {
  fn: Fn;
  /** Allowed argument counts: [min, max]. */
  arity: [number, number];
}

const defs: Record<string, FnDef> = {
  abs: { fn: Math.abs, arity: [1, 1] },
  sqrt: { fn: Math.sqrt, arity: [1, 1] },
  cbrt: { fn: Math.cbrt, arity: [1, 1] },
  exp: { fn: Math.exp, arity: [1, 1] },
  log: { fn: Math.log, arity: [1, 1] },
  log10: { fn: Math.log10, arity: [1, 1] },
  pow: { fn: Math.pow, arity: [2, 2] },
  hypot: { fn: Math.hypot, arity: [2, 3] },
  min: { fn: Math.min, arity: [1, 8] },
  max: { fn: Math.max, arity: [1, 8] },
  floor: { fn: Math.floor, arity: [1, 1] },
  ceil: { fn: Math.ceil, arity: [1, 1] },
  round: { fn: Math.round, arity: [1, 1] },
  sign: { fn: Math.sign, arity: [1, 1] },
  clamp: { fn: (x, lo, hi) => Math.min(Math.max(x, lo!), hi!), arity: [3, 3] },
  sin: { fn: Math.sin, arity: [1, 1] },
  cos: { fn: Math.cos, arity: [1, 1] },
  tan: { fn: Math.tan, arity: [1, 1] },
  asin: { fn: Math.asin, arity: [1, 1] },
  acos: { fn: Math.acos, arity: [1, 1] },
  atan: { fn: Math.atan, arity: [1, 1] },
  atan2: { fn: Math.atan2, arity: [2, 2] },
  sind: { fn: (a) => Math.sin(a! * D), arity: [1, 1] },
  cosd: { fn: (a) => Math.cos(a! * D), arity: [1, 1] },
  tand: { fn: (a) => Math.tan(a! * D), arity: [1, 1] },
  asind: { fn: (x) => Math.asin(x!) / D, arity: [1, 1] },
  acosd: { fn: (x) => Math.acos(x!) / D, arity: [1, 1] },
  atand: { fn: (x) => Math.atan(x!) / D, arity: [1, 1] },
  atan2d: { fn: (y, x) => Math.atan2(y!, x!) / D, arity: [2, 2] },
  deg: { fn: (r) => r! / D, arity: [1, 1] },
  rad: { fn: (d) => d! * D, arity: [1, 1] },
};

/** A lookup that cannot reach Object.prototype ('constructor', '__proto__', …). */
export const FUNCTIONS: ReadonlyMap<string, FnDef> = new Map(Object.entries(defs));

export const CONSTANTS: ReadonlyMap<string, number> = new Map([
  ['pi', Math.PI],
  // Standard gravity in m/s²: with masses in kg it gives weights in N (CGPM 1901, exact).
  ['g', 9.80665],
]);

/** Names that must never be resolved, whatever a scope holds; rejected with their own message. */
export const FORBIDDEN_NAMES = new Set([
  'constructor',
  '__proto__',
  'prototype',
  '__defineGetter__',
  '__defineSetter__',
  '__lookupGetter__',
  '__lookupSetter__',
  'import',
  'require',
  'eval',
  'Function',
  'globalThis',
  'window',
  'self',
  'process',
  'this',
]);
