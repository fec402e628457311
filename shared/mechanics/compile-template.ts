import type { Quantity } from '../units/quantities';
import type { Direction, NumberOrExpr, TemplateSpec } from '../spec/template-spec';
import { SpecError, type SpecIssue } from './errors';
import { compileExpression, type CompiledExpression, type Evaluator, type Scope } from './expressions/compile';
import { CONSTANTS, FUNCTIONS } from './expressions/functions';
import { ExpressionError } from './expressions/parse';
import type { PointOp } from './geometry';
import type { SolveEnv } from './solve-env';
import { len } from './vec';

/** A direction evaluated per solve: an angle expression, or from one point towards another. */
export type DirectionPlan = { angle: Evaluator<SolveEnv> } | { from: number; to: number };

/** One column of the equilibrium matrix: an unknown force magnitude or component. */
export type Column =
  | { kind: 'pin-x' | 'pin-y' | 'normal' | 'tangent' | 'slip'; joint: number; label: string }
  | { kind: 'member'; member: number; label: string }
  | { kind: 'load' | 'couple'; load: number; label: string };

/** Where a column's unit force acts: on which part (−1 for ground), at which point, with what sign. */
export interface Application {
  column: number;
  part: number;
  point: number;
  sign: 1 | -1;
}

export interface JointPlan {
  id: string;
  label: string;
  kind: 'pin' | 'roller' | 'contact';
  point: number;
  parts: [number, number];
  partIds: [string, string];
  normal?: DirectionPlan;
  friction: 'none' | 'required' | { coefficient: Evaluator<SolveEnv>; sense: 1 | -1 };
  columns: number[];
  /** How the force reads in each part's free body: "pin B (from Link B–C)". */
  sideLabels: [string, string];
}

export interface MemberPlan {
  id: string;
  label: string;
  ends: [number, number];
  parts: [number, number];
  partIds: [string, string];
  column: number;
}

export type LoadPlan =
  | {
      id: string;
      label: string;
      kind: 'force';
      part: number;
      partId: string;
      point: number;
      known?: { x: Evaluator<SolveEnv>; y: Evaluator<SolveEnv> } | { magnitude: Evaluator<SolveEnv>; direction: DirectionPlan };
      /** For a load of unknown magnitude: its direction and its matrix column. */
      unknown?: { direction: DirectionPlan; column: number };
    }
  | {
      id: string;
      label: string;
      kind: 'couple';
      part: number;
      partId: string;
      /** A known moment, or the matrix column of a couple the solve finds. */
      moment?: Evaluator<SolveEnv>;
      unknownColumn?: number;
    };

export interface ValuePlan {
  key: string;
  label: string;
  quantity: Quantity | undefined;
  slot: number;
  evaluate: Evaluator<SolveEnv>;
  help?: string | undefined;
}

export interface CheckPlan {
  key: string;
  label: string;
  pass: Evaluator<SolveEnv>;
  warn?: Evaluator<SolveEnv>;
  severity: 'fail' | 'warn';
  advice: string;
}

export interface CompiledTemplate {
  spec: TemplateSpec;
  inputs: TemplateSpec['inputs'];
  derived: ValuePlan[];
  results: ValuePlan[];
  checks: CheckPlan[];
  valueCount: number;
  pointNames: string[];
  pointIndex: Map<string, number>;
  pointOps: PointOp[];
  parts: { id: string; label: string; outline: number[] }[];
  joints: JointPlan[];
  members: MemberPlan[];
  loads: LoadPlan[];
  columns: Column[];
  applications: Application[];
  /** Index of the drive input, effort and output loads, when the spec declares a drive. */
  drive?: { input: number; effort: number; output: number };
  /** True when a contact carries friction at slipping: virtual work does not apply then. */
  dissipative: boolean;
  /** Matrix row of each part equation (3 per part: ΣFx, ΣFy, ΣM), −1 where dropped. */
  rowOf: Int32Array;
  /** The part of each matrix row. */
  rowPart: Int32Array;
}

const DIRECTION_ACCESSORS = new Set(['x', 'y', 'dist', 'dir']);

/**
 * Turns a parsed spec into a plan of closures and indices. Every problem found is collected
 * with its path and thrown together as one SpecError, so an author sees the whole list.
 */
export function compileTemplate(spec: TemplateSpec): CompiledTemplate {
  const issues: SpecIssue[] = [];
  const issue = (path: (string | number)[], message: string) => issues.push({ path, message });

  // ---- names ---------------------------------------------------------------------------
  const slots = new Map<string, number>();
  const claim = (key: string, path: (string | number)[]) => {
    if (slots.has(key)) issue(path, `the name '${key}' is used twice (inputs, derived values and results share one namespace)`);
    else if (CONSTANTS.has(key) || FUNCTIONS.has(key) || DIRECTION_ACCESSORS.has(key)) {
      issue(path, `the name '${key}' is reserved for a constant or function`);
    }
    slots.set(key, slots.size);
  };
  spec.inputs.forEach((inp, i) => {
    claim(inp.key, ['inputs', i, 'key']);
    if (inp.min > inp.max) issue(['inputs', i, 'min'], `min (${inp.min}) is above max (${inp.max})`);
    if (inp.default < inp.min || inp.default > inp.max) {
      issue(['inputs', i, 'default'], `the default ${inp.default} lies outside ${inp.min}…${inp.max}`);
    }
    if (inp.control === 'choice' && !(inp.choices && inp.choices.length > 0)) {
      issue(['inputs', i, 'choices'], "a 'choice' input needs at least one choice");
    }
  });
  spec.derived.forEach((d, i) => claim(d.key, ['derived', i, 'key']));
  spec.results.forEach((r, i) => claim(r.key, ['results', i, 'key']));
  const valueCount = slots.size;

  const pointNames = Object.keys(spec.points);
  const pointIndex = new Map(pointNames.map((n, i) => [n, i]));
  const partIds = spec.parts.map((p) => p.id);
  const partIndex = new Map(partIds.map((id, i) => [id, i]));
  const dupes = (ids: string[], where: string) =>
    ids.forEach((id, i) => ids.indexOf(id) !== i && issue([where, i, 'id'], `the id '${id}' is used twice`));
  dupes(partIds, 'parts');
  dupes(spec.members.map((m) => m.id), 'members');
  dupes(spec.joints.map((j) => j.id), 'joints');
  dupes(spec.loads.map((l) => l.id), 'loads');

  const pointAt = (name: string, path: (string | number)[]): number => {
    const i = pointIndex.get(name);
    if (i === undefined) {
      issue(path, `refers to the point '${name}', which is not defined`);
      return 0;
    }
    return i;
  };
  const partAt = (id: string, path: (string | number)[]): number => {
    if (id === 'ground') return -1;
    const i = partIndex.get(id);
    if (i === undefined) {
      issue(path, `refers to the part '${id}', which does not exist (parts: ${partIds.join(', ')}, or 'ground')`);
      return -1;
    }
    return i;
  };

  // ---- scopes --------------------------------------------------------------------------
  const slotRead = (allowed: (slot: number) => boolean) => (name: string) => {
    const s = slots.get(name);
    return s !== undefined && allowed(s) ? (env: SolveEnv) => env.v[s]! : undefined;
  };
  const pointAccessor = (fn: string, args: string[]): Evaluator<SolveEnv> | string | undefined => {
    if (!DIRECTION_ACCESSORS.has(fn)) return undefined;
    const want = fn === 'x' || fn === 'y' ? 1 : 2;
    if (args.length !== want) return `${fn}() takes ${want} point name(s)`;
    const idx = args.map((a) => pointIndex.get(a));
    const missing = args.find((_, k) => idx[k] === undefined);
    if (missing !== undefined) return `${fn}('${args.join("', '")}'): there is no point named '${missing}'`;
    const [a, b] = idx as number[];
    if (fn === 'x') return (env) => env.px[a!]!;
    if (fn === 'y') return (env) => env.py[a!]!;
    if (fn === 'dist') return (env) => len(env.px[b!]! - env.px[a!]!, env.py[b!]! - env.py[a!]!);
    return (env) => (Math.atan2(env.py[b!]! - env.py[a!]!, env.px[b!]! - env.px[a!]!) * 180) / Math.PI;
  };
  const jointIndex = new Map(spec.joints.map((j, i) => [j.id, i]));
  const memberIndex = new Map(spec.members.map((m, i) => [m.id, i]));
  const loadIndex = new Map(spec.loads.map((l, i) => [l.id, i]));
  const solvedAccessor = (fn: string, args: string[]): Evaluator<SolveEnv> | string | undefined => {
    const one = (map: Map<string, number>, what: string): number | string => {
      if (args.length !== 1) return `${fn}() takes one ${what} id`;
      const i = map.get(args[0]!);
      return i === undefined ? `${fn}('${args[0]}'): there is no ${what} '${args[0]}'` : i;
    };
    switch (fn) {
      case 'member': {
        const i = one(memberIndex, 'member');
        return typeof i === 'string' ? i : (env) => env.axial[i]!;
      }
      case 'jointX':
      case 'jointY':
      case 'joint':
      case 'normal':
      case 'friction':
      case 'muRequired': {
        const i = one(jointIndex, 'joint');
        if (typeof i === 'string') return i;
        if (fn === 'jointX') return (env) => env.jfx[i]!;
        if (fn === 'jointY') return (env) => env.jfy[i]!;
        if (fn === 'joint') return (env) => len(env.jfx[i]!, env.jfy[i]!);
        const j = spec.joints[i]!;
        if (j.kind === 'pin') return `${fn}('${args[0]}'): '${args[0]}' is a pin; normal and friction forces belong to contacts and rollers`;
        if (fn === 'normal') return (env) => env.jn[i]!;
        if (fn === 'friction') return (env) => env.jt[i]!;
        // Needed coefficient |F|/N; a contact that pulls (N ≤ 0) cannot be held by friction.
        return (env) => (env.jn[i]! > 0 ? Math.abs(env.jt[i]!) / env.jn[i]! : Infinity);
      }
      case 'load':
      case 'loadX':
      case 'loadY': {
        const i = one(loadIndex, 'load');
        if (typeof i === 'string') return i;
        if (fn === 'load') return (env) => env.lmag[i]!;
        return fn === 'loadX' ? (env) => env.lfx[i]! : (env) => env.lfy[i]!;
      }
      default:
        return pointAccessor(fn, args);
    }
  };
  const inputsAndDerived = slotRead((s) => s < spec.inputs.length + spec.derived.length);
  const derivedScope: Scope<SolveEnv> = {
    name: inputsAndDerived,
    accessor: (fn) => (DIRECTION_ACCESSORS.has(fn) ? 'derived values are computed before the geometry, so they cannot read points' : undefined),
  };
  const geometryScope: Scope<SolveEnv> = { name: inputsAndDerived, accessor: pointAccessor };

  const compile = (
    src: NumberOrExpr,
    scope: Scope<SolveEnv>,
    path: (string | number)[],
  ): CompiledExpression<SolveEnv> | undefined => {
    if (typeof src === 'number') {
      if (!Number.isFinite(src)) {
        issue(path, 'must be a finite number');
        return undefined;
      }
      return { evaluate: () => src, names: new Set(), accessors: [], constant: true };
    }
    try {
      return compileExpression(src, scope);
    } catch (err) {
      if (err instanceof ExpressionError) issue(path, `the expression '${err.source}' ${err.message}`);
      else throw err;
      return undefined;
    }
  };
  const NAN: Evaluator<SolveEnv> = () => NaN;
  const ev = (src: NumberOrExpr, scope: Scope<SolveEnv>, path: (string | number)[]) => compile(src, scope, path)?.evaluate ?? NAN;

  // ---- derived values, in dependency order ------------------------------------------------
  const derivedCompiled = spec.derived.map((d, i) => compile(d.expr, derivedScope, ['derived', i, 'expr']));
  const derivedKeys = new Map(spec.derived.map((d, i) => [d.key, i]));
  const derivedOrder = topoSort(
    spec.derived.map((_, i) => [...(derivedCompiled[i]?.names ?? [])].map((n) => derivedKeys.get(n)).filter((k): k is number => k !== undefined)),
    (cycle) => issue(['derived', cycle[0]!, 'expr'], `derived values refer to each other in a cycle: ${cycle.map((k) => spec.derived[k]!.key).join(' → ')}`),
  );
  const derived: ValuePlan[] = derivedOrder.map((i) => {
    const d = spec.derived[i]!;
    return { key: d.key, label: d.label ?? d.key, quantity: d.quantity, slot: slots.get(d.key)!, evaluate: derivedCompiled[i]?.evaluate ?? NAN };
  });

  // ---- points, in dependency order ---------------------------------------------------------
  const pointDeps: number[][] = [];
  const unordered: PointOp[] = pointNames.map((name, target) => {
    const def = spec.points[name]!;
    const base = ['points', name];
    const deps: number[] = [];
    const ref = (n: string, path: (string | number)[]) => {
      const i = pointAt(n, [...base, ...path]);
      deps.push(i);
      return i;
    };
    const param = (src: NumberOrExpr, path: string[]) => {
      const c = compile(src, geometryScope, [...base, ...path]);
      for (const a of c?.accessors ?? []) for (const arg of a.args) deps.push(pointIndex.get(arg)!);
      return c?.evaluate ?? NAN;
    };
    let op: PointOp;
    if ('at' in def) op = { kind: 'at', target, x: param(def.at[0], ['at', '0']), y: param(def.at[1], ['at', '1']) };
    else if ('polar' in def) {
      const p = def.polar;
      op = { kind: 'polar', target, from: ref(p.from, ['polar', 'from']), length: param(p.length, ['polar', 'length']), angle: param(p.angle, ['polar', 'angle']) };
    } else if ('offset' in def) {
      const p = def.offset;
      op = { kind: 'offset', target, from: ref(p.from, ['offset', 'from']), dx: param(p.dx, ['offset', 'dx']), dy: param(p.dy, ['offset', 'dy']) };
    } else if ('fromTwo' in def) {
      const p = def.fromTwo;
      op = {
        kind: 'fromTwo',
        target,
        a: ref(p.centres[0], ['fromTwo', 'centres', 0]),
        b: ref(p.centres[1], ['fromTwo', 'centres', 1]),
        ra: param(p.radii[0], ['fromTwo', 'radii', '0']),
        rb: param(p.radii[1], ['fromTwo', 'radii', '1']),
        left: p.side === 'left',
      };
    } else if ('mirror' in def) {
      const p = def.mirror;
      op = { kind: 'mirror', target, of: ref(p.of, ['mirror', 'of']), p: ref(p.line[0], ['mirror', 'line', 0]), q: ref(p.line[1], ['mirror', 'line', 1]) };
    } else if ('along' in def) {
      const p = def.along;
      op = {
        kind: 'along',
        target,
        from: ref(p.from, ['along', 'from']),
        to: ref(p.to, ['along', 'to']),
        ...(p.fraction !== undefined ? { fraction: param(p.fraction, ['along', 'fraction']) } : {}),
        ...(p.distance !== undefined ? { distance: param(p.distance, ['along', 'distance']) } : {}),
      };
    } else {
      const [[a, b], [c, d]] = def.intersect.lines;
      op = {
        kind: 'intersect',
        target,
        a: ref(a, ['intersect', 'lines', 0, 0]),
        b: ref(b, ['intersect', 'lines', 0, 1]),
        c: ref(c, ['intersect', 'lines', 1, 0]),
        d: ref(d, ['intersect', 'lines', 1, 1]),
      };
    }
    pointDeps.push(deps);
    return op;
  });
  const pointOrder = topoSort(pointDeps, (cycle) =>
    issue(['points', pointNames[cycle[0]!]!], `points are defined from each other in a cycle: ${cycle.map((k) => pointNames[k]).join(' → ')}`),
  );
  const pointOps = pointOrder.map((i) => unordered[i]!);

  // ---- parts, joints, members, loads: the columns of the equilibrium matrix ---------------
  const parts = spec.parts.map((p, i) => ({ id: p.id, label: p.label, outline: p.outline.map((n, k) => pointAt(n, ['parts', i, 'outline', k])) }));
  const columns: Column[] = [];
  const applications: Application[] = [];
  const addColumn = (c: Column) => columns.push(c) - 1;
  const direction = (d: Direction, path: (string | number)[]): DirectionPlan =>
    'angle' in d
      ? { angle: ev(d.angle, geometryScope, [...path, 'angle']) }
      : { from: pointAt(d.towards[0], [...path, 'towards', 0]), to: pointAt(d.towards[1], [...path, 'towards', 1]) };

  let dissipative = false;
  const joints: JointPlan[] = spec.joints.map((j, i) => {
    const path = ['joints', i];
    const point = pointAt(j.at, [...path, 'at']);
    const pa = partAt(j.between[0], [...path, 'between', 0]);
    const pb = partAt(j.between[1], [...path, 'between', 1]);
    if (j.between[0] === j.between[1]) issue([...path, 'between'], `joins the part '${j.between[0]}' to itself`);
    if (pa === -1 && pb === -1 && j.between[0] === 'ground' && j.between[1] === 'ground') issue([...path, 'between'], 'joins ground to ground');
    const name = j.label ?? `${j.kind} ${j.id}`;
    let normal: DirectionPlan | undefined;
    let friction: JointPlan['friction'] = 'none';
    const cols: number[] = [];
    if (j.kind === 'pin') {
      if (j.normal) issue([...path, 'normal'], 'a pin takes no normal direction (it carries force in any direction)');
      if (j.friction) issue([...path, 'friction'], 'friction belongs to contacts');
      cols.push(addColumn({ kind: 'pin-x', joint: i, label: `${name} (x)` }), addColumn({ kind: 'pin-y', joint: i, label: `${name} (y)` }));
    } else {
      if (!j.normal) issue([...path, 'normal'], `a ${j.kind} needs the direction of its normal force`);
      else normal = direction(j.normal, [...path, 'normal']);
      if (j.kind === 'roller' && j.friction) issue([...path, 'friction'], "a roller is frictionless; use kind 'contact' for friction");
      if (j.friction === 'required') {
        friction = 'required';
        cols.push(addColumn({ kind: 'normal', joint: i, label: `${name} (normal)` }), addColumn({ kind: 'tangent', joint: i, label: `${name} (friction)` }));
      } else if (j.friction) {
        friction = { coefficient: ev(j.friction.coefficient, geometryScope, [...path, 'friction', 'coefficient']), sense: j.friction.sense };
        dissipative = true;
        cols.push(addColumn({ kind: 'slip', joint: i, label: `${name} (normal, slipping)` }));
      } else {
        cols.push(addColumn({ kind: 'normal', joint: i, label: `${name} (normal)` }));
      }
    }
    for (const c of cols) {
      applications.push({ column: c, part: pa, point, sign: 1 });
      applications.push({ column: c, part: pb, point, sign: -1 });
    }
    const partLabel = (id: string) => (id === 'ground' ? 'ground' : (spec.parts.find((q) => q.id === id)?.label ?? id));
    const sideLabels: [string, string] = [`${name} (from ${partLabel(j.between[1])})`, `${name} (from ${partLabel(j.between[0])})`];
    return { id: j.id, label: name, kind: j.kind, point, parts: [pa, pb], partIds: j.between, ...(normal ? { normal } : {}), friction, columns: cols, sideLabels };
  });

  const members: MemberPlan[] = spec.members.map((m, i) => {
    const path = ['members', i];
    const ends: [number, number] = [pointAt(m.ends[0], [...path, 'ends', 0]), pointAt(m.ends[1], [...path, 'ends', 1])];
    const ps: [number, number] = [partAt(m.connects[0], [...path, 'connects', 0]), partAt(m.connects[1], [...path, 'connects', 1])];
    if (m.ends[0] === m.ends[1]) issue([...path, 'ends'], 'a member needs two different end points');
    const column = addColumn({ kind: 'member', member: i, label: m.label });
    // Unit vector u runs from end 0 to end 1; tension pulls end 0's part along +u, end 1's along −u.
    applications.push({ column, part: ps[0], point: ends[0], sign: 1 });
    applications.push({ column, part: ps[1], point: ends[1], sign: -1 });
    return { id: m.id, label: m.label, ends, parts: ps, partIds: m.connects, column };
  });

  const loads: LoadPlan[] = spec.loads.map((l, i) => {
    const path = ['loads', i];
    const part = partAt(l.on, [...path, 'on']);
    if (l.kind === 'couple') {
      if (typeof l.moment === 'object') {
        if (part < 0) issue([...path, 'on'], 'a couple of unknown moment must act on a part, not on ground');
        const column = addColumn({ kind: 'couple', load: i, label: l.label });
        return { id: l.id, label: l.label, kind: 'couple', part, partId: l.on, unknownColumn: column };
      }
      return { id: l.id, label: l.label, kind: 'couple', part, partId: l.on, moment: ev(l.moment, geometryScope, [...path, 'moment']) };
    }
    const point = pointAt(l.at, [...path, 'at']);
    const f = l.force;
    if ('unknown' in f) {
      const column = addColumn({ kind: 'load', load: i, label: l.label });
      applications.push({ column, part, point, sign: 1 });
      return { id: l.id, label: l.label, kind: 'force', part, partId: l.on, point, unknown: { direction: direction(f.direction, [...path, 'force', 'direction']), column } };
    }
    const known =
      'x' in f
        ? { x: ev(f.x, geometryScope, [...path, 'force', 'x']), y: ev(f.y, geometryScope, [...path, 'force', 'y']) }
        : { magnitude: ev(f.magnitude, geometryScope, [...path, 'force', 'magnitude']), direction: direction(f.direction, [...path, 'force', 'direction']) };
    return { id: l.id, label: l.label, kind: 'force', part, partId: l.on, point, known };
  });

  // ---- results and checks ----------------------------------------------------------------
  const firstResultSlot = spec.inputs.length + spec.derived.length;
  const results: ValuePlan[] = spec.results.map((r, i) => {
    const slot = firstResultSlot + i;
    const scope: Scope<SolveEnv> = { name: slotRead((s) => s < slot), accessor: solvedAccessor };
    return { key: r.key, label: r.label, quantity: r.quantity, slot, help: r.help, evaluate: ev(r.expr, scope, ['results', i, 'expr']) };
  });
  const checkScope: Scope<SolveEnv> = { name: slotRead(() => true), accessor: solvedAccessor };
  const checks: CheckPlan[] = spec.checks.map((c, i) => ({
    key: c.key,
    label: c.label,
    severity: c.severity,
    advice: c.advice,
    pass: ev(c.pass, checkScope, ['checks', i, 'pass']),
    ...(c.warn ? { warn: ev(c.warn, checkScope, ['checks', i, 'warn']) } : {}),
  }));

  // ---- references and drive --------------------------------------------------------------
  spec.references.forEach((ref, i) => {
    for (const k of Object.keys(ref.inputs)) {
      if (!spec.inputs.some((inp) => inp.key === k)) issue(['references', i, 'inputs', k], `'${k}' is not an input of this template`);
    }
    for (const k of Object.keys(ref.expect)) {
      if (!spec.results.some((r) => r.key === k)) issue(['references', i, 'expect', k], `'${k}' is not a result of this template`);
    }
  });
  let drive: CompiledTemplate['drive'];
  if (spec.drive) {
    const input = spec.inputs.findIndex((inp) => inp.key === spec.drive!.input);
    const effort = spec.loads.findIndex((l) => l.id === spec.drive!.effort);
    const output = spec.loads.findIndex((l) => l.id === spec.drive!.output);
    if (input < 0) issue(['drive', 'input'], `'${spec.drive.input}' is not an input`);
    if (effort < 0) issue(['drive', 'effort'], `'${spec.drive.effort}' is not a load`);
    if (output < 0) issue(['drive', 'output'], `'${spec.drive.output}' is not a load`);
    if (input >= 0 && effort >= 0 && output >= 0) drive = { input, effort, output };
  }
  spec.dimensions.forEach((d, i) => {
    if (!spec.inputs.some((inp) => inp.key === d.input)) issue(['dimensions', i, 'input'], `'${d.input}' is not an input`);
    d.between.forEach((p, k) => pointAt(p, ['dimensions', i, 'between', k]));
  });

  // A part whose forces all act at one named point (a ring, a hook node, a block taken as a
  // particle) has two equations, not three: its moment row would be identically zero and read
  // as a spurious free rotation. A couple on it keeps the row, so the imbalance shows.
  const touched = parts.map((p) => new Set(p.outline));
  for (const ap of applications) if (ap.part >= 0) touched[ap.part]!.add(ap.point);
  for (const l of loads) if (l.part >= 0 && l.kind === 'force') touched[l.part]!.add(l.point);
  const rowOf = new Int32Array(3 * parts.length).fill(-1);
  const rowParts: number[] = [];
  parts.forEach((_, p) => {
    const node = touched[p]!.size === 1 && !loads.some((l) => l.kind === 'couple' && l.part === p);
    for (let k = 0; k < (node ? 2 : 3); k++) {
      rowOf[3 * p + k] = rowParts.length;
      rowParts.push(p);
    }
  });

  if (issues.length > 0) throw new SpecError(issues);
  return {
    rowOf,
    rowPart: Int32Array.from(rowParts),
    spec,
    inputs: spec.inputs,
    derived,
    results,
    checks,
    valueCount,
    pointNames,
    pointIndex,
    pointOps,
    parts,
    joints,
    members,
    loads,
    columns,
    applications,
    ...(drive ? { drive } : {}),
    dissipative,
  };
}

/** Depth-first topological order of nodes 0…n−1 given each node's dependencies; reports one cycle. */
function topoSort(deps: number[][], onCycle: (cycle: number[]) => void): number[] {
  const state = new Uint8Array(deps.length); // 0 new, 1 on stack, 2 done
  const order: number[] = [];
  const stack: number[] = [];
  let reported = false;
  const visit = (i: number) => {
    if (state[i] === 2) return;
    if (state[i] === 1) {
      if (!reported) onCycle([...stack.slice(stack.indexOf(i)), i]);
      reported = true;
      return;
    }
    state[i] = 1;
    stack.push(i);
    for (const d of deps[i] ?? []) visit(d);
    stack.pop();
    state[i] = 2;
    order.push(i);
  };
  for (let i = 0; i < deps.length; i++) visit(i);
  return order;
}
