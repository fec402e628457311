import { CONSTANTS, FORBIDDEN_NAMES, FUNCTIONS } from './functions';
import { ExpressionError, MAX_EXPRESSION_DEPTH, parseExpression, type Node } from './parse';

export type Evaluator<E> = (env: E) => number;

/**
 * What an expression may refer to in one phase of a solve. Derived values see inputs; point
 * coordinates see derived values; results see solved forces. The compiler asks the scope, so
 * a name from a later phase is an error at compile time, not a wrong number at run time.
 */
export interface Scope<E> {
  name(name: string): Evaluator<E> | undefined;
  /** undefined: not an accessor here. A string: the reason the call cannot be served. */
  accessor(fn: string, args: string[]): Evaluator<E> | string | undefined;
}

export interface CompiledExpression<E> {
  evaluate: Evaluator<E>;
  /** Plain names the expression reads (inputs, derived values, results). */
  names: Set<string>;
  /** Accessor calls, e.g. { fn: 'member', args: ['AB'] }. */
  accessors: { fn: string; args: string[] }[];
  /** True when the expression reads nothing and so is a constant. */
  constant: boolean;
}

const BINARY: Record<string, (a: number, b: number) => number> = {
  '+': (a, b) => a + b,
  '-': (a, b) => a - b,
  '*': (a, b) => a * b,
  '/': (a, b) => a / b,
  '%': (a, b) => a % b,
  '^': (a, b) => a ** b,
  '**': (a, b) => a ** b,
  '<': (a, b) => (a < b ? 1 : 0),
  '<=': (a, b) => (a <= b ? 1 : 0),
  '>': (a, b) => (a > b ? 1 : 0),
  '>=': (a, b) => (a >= b ? 1 : 0),
  '==': (a, b) => (a === b ? 1 : 0),
  '!=': (a, b) => (a !== b ? 1 : 0),
};

/** Parse and compile once; the returned closure only does arithmetic on numbers. */
export function compileExpression<E>(source: string, scope: Scope<E>): CompiledExpression<E> {
  const tree = parseExpression(source);
  const names = new Set<string>();
  const accessors: { fn: string; args: string[] }[] = [];
  const fail = (message: string): never => {
    throw new ExpressionError(message, source);
  };

  const build = (node: Node, depth: number): Evaluator<E> => {
    if (depth > MAX_EXPRESSION_DEPTH) fail(`nests deeper than ${MAX_EXPRESSION_DEPTH} levels`);
    switch (node.type) {
      case 'Literal': {
        const value = (node as unknown as { value: unknown }).value;
        if (typeof value === 'number' && Number.isFinite(value)) return () => value;
        if (typeof value === 'boolean') return value ? () => 1 : () => 0;
        return fail(
          typeof value === 'string'
            ? `the text '${value}' can only name a point, part, member, joint or load inside an accessor such as member('${value}')`
            : 'holds a value that is not a number',
        );
      }
      case 'Identifier': {
        const name = (node as unknown as { name: string }).name;
        if (FORBIDDEN_NAMES.has(name)) fail(`refers to '${name}', which is not allowed in an expression`);
        const constant = CONSTANTS.get(name);
        const resolved = scope.name(name);
        if (resolved) {
          names.add(name);
          return resolved;
        }
        if (constant !== undefined) return () => constant;
        if (FUNCTIONS.has(name)) fail(`uses the function '${name}' without calling it`);
        return fail(`refers to '${name}', which is not an input, derived value or result available here`);
      }
      case 'UnaryExpression': {
        const { operator, argument } = node as unknown as { operator: string; argument: Node };
        const arg = build(argument, depth + 1);
        if (operator === '-') return (env) => -arg(env);
        if (operator === '+') return arg;
        if (operator === '!') return (env) => (arg(env) ? 0 : 1);
        return fail(`uses the operator '${operator}', which is not allowed`);
      }
      case 'BinaryExpression': {
        const { operator, left, right } = node as unknown as { operator: string; left: Node; right: Node };
        const a = build(left, depth + 1);
        const b = build(right, depth + 1);
        if (operator === '&&') return (env) => (a(env) && b(env) ? 1 : 0);
        if (operator === '||') return (env) => (a(env) || b(env) ? 1 : 0);
        const op = Object.prototype.hasOwnProperty.call(BINARY, operator) ? BINARY[operator] : undefined;
        if (!op) return fail(`uses the operator '${operator}', which is not allowed`);
        return (env) => op(a(env), b(env));
      }
      case 'ConditionalExpression': {
        const { test, consequent, alternate } = node as unknown as { test: Node; consequent: Node; alternate: Node };
        const t = build(test, depth + 1);
        const c = build(consequent, depth + 1);
        const f = build(alternate, depth + 1);
        return (env) => (t(env) ? c(env) : f(env));
      }
      case 'CallExpression': {
        const { callee, arguments: args } = node as unknown as { callee: Node; arguments: Node[] };
        if (callee.type !== 'Identifier') return fail('may only call named functions');
        const fnName = (callee as unknown as { name: string }).name;
        if (FORBIDDEN_NAMES.has(fnName)) fail(`refers to '${fnName}', which is not allowed in an expression`);
        // Accessors take names as text: member('AB'), dist('A', 'B').
        if (args.length > 0 && args.every((a) => a.type === 'Literal' && typeof (a as unknown as { value: unknown }).value === 'string')) {
          const textArgs = args.map((a) => String((a as unknown as { value: unknown }).value));
          const served = scope.accessor(fnName, textArgs);
          if (typeof served === 'string') return fail(served);
          if (served) {
            accessors.push({ fn: fnName, args: textArgs });
            return served;
          }
          return fail(`has no accessor '${fnName}' here`);
        }
        const def = FUNCTIONS.get(fnName);
        if (!def) return fail(`calls '${fnName}', which is not a known function`);
        const [lo, hi] = def.arity;
        if (args.length < lo || args.length > hi) {
          fail(`calls ${fnName} with ${args.length} argument(s); it takes ${lo === hi ? lo : `${lo} to ${hi}`}`);
        }
        const parts = args.map((a) => build(a, depth + 1));
        const fn = def.fn;
        if (parts.length === 1) {
          const p0 = parts[0]!;
          return (env) => fn(p0(env));
        }
        if (parts.length === 2) {
          const p0 = parts[0]!;
          const p1 = parts[1]!;
          return (env) => fn(p0(env), p1(env));
        }
        return (env) => fn(...parts.map((p) => p(env)));
      }
      case 'MemberExpression':
        return fail('may not read properties (a.b or a[b])');
      case 'Compound':
        return fail('holds more than one expression');
      default:
        return fail(`uses a construct (${node.type}) that is not allowed`);
    }
  };

  const evaluate = build(tree, 0);
  return { evaluate, names, accessors, constant: names.size === 0 && accessors.length === 0 };
}
