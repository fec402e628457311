import { readFileSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { compileExpression, type Scope } from '../../shared/mechanics/expressions/compile';
import { ExpressionError } from '../../shared/mechanics/expressions/parse';

type Env = { a: number; b: number };
const scope: Scope<Env> = {
  name: (n) => (n === 'a' ? (e) => e.a : n === 'b' ? (e) => e.b : undefined),
  accessor: (fn, args) => (fn === 'len' ? (args[0] === 'AB' ? () => 250 : `no segment ${args[0]}`) : undefined),
};
const run = (src: string, env: Env = { a: 3, b: 4 }) => compileExpression(src, scope).evaluate(env);
const reject = (src: string) => () => compileExpression(src, scope);

describe('expressions', () => {
  it('do arithmetic with the usual precedence, ^ as right-associative power', () => {
    expect(run('a + b * 2')).toBe(11);
    expect(run('(a + b) * 2')).toBe(14);
    expect(run('2 ^ 3 ^ 2')).toBe(512);
    expect(run('a ** 2 + b ** 2')).toBe(25);
    expect(run('-a + 10 % 4')).toBe(-1);
  });

  it('compare and branch, booleans as 1 and 0', () => {
    expect(run('a < b')).toBe(1);
    expect(run('a >= b')).toBe(0);
    expect(run('a < b && b < 5 ? 7 : 9')).toBe(7);
    expect(run('!(a == 3) || false')).toBe(0);
  });

  it('offer degree-based trigonometry beside radian trigonometry', () => {
    expect(run('sind(30)')).toBeCloseTo(0.5, 15);
    expect(run('cosd(60)')).toBeCloseTo(0.5, 15);
    expect(run('tand(45)')).toBeCloseTo(1, 15);
    expect(run('atan2d(b, a)')).toBeCloseTo((Math.atan2(4, 3) * 180) / Math.PI, 13);
    expect(run('sin(pi / 6)')).toBeCloseTo(0.5, 15);
    expect(run('hypot(a, b)')).toBe(5);
    expect(run('max(a, b, 10) - min(a, b)')).toBe(7);
    expect(run('clamp(12, 0, 10)')).toBe(10);
    expect(run('2 * g')).toBeCloseTo(19.6133, 10);
  });

  it('serve accessors with text arguments, and report an unknown name inside them', () => {
    expect(run("len('AB') / 2")).toBe(125);
    expect(reject("len('XY')")).toThrow(/no segment XY/);
  });

  it('report which names they read', () => {
    const c = compileExpression("a * len('AB')", scope);
    expect([...c.names]).toEqual(['a']);
    expect(c.accessors).toEqual([{ fn: 'len', args: ['AB'] }]);
  });

  it.each([
    ['constructor', /not allowed/],
    ['__proto__', /not allowed/],
    ['a.constructor', /may not read properties/],
    ["a['constructor']", /may not read properties/],
    ['this', /not allowed|construct/],
    ['prototype', /not allowed/],
    ['import', /not allowed/],
    ['eval(1)', /not allowed/],
    ['Function(1)', /not allowed/],
    ['process', /not allowed/],
    ['toString', /not an input/],
    ['valueOf(1)', /not a known function/],
    ['hasOwnProperty', /not an input/],
    ['Math.sin(1)', /may only call named functions/],
    ['[1, 2]', /not allowed|construct/],
    ['a = 3', /cannot be read|not allowed/],
    ['a; b', /more than one|cannot be read/],
    ['a | b', /cannot be read|not allowed/],
    ['~a', /cannot be read|not allowed/],
    ["'text'", /can only name/],
    ['sin', /without calling it/],
    ['sqrt(1, 2)', /takes 1/],
    ['unknownFn(2)', /not a known function/],
    ['zz + 1', /'zz'/],
    ['', /empty/],
    ['a +', /cannot be read/],
  ])('reject %s', (src, msg) => {
    expect(reject(src)).toThrow(ExpressionError);
    expect(reject(src)).toThrow(msg);
  });

  it('reject very long and deeply nested expressions before evaluating anything', () => {
    expect(reject('a+'.repeat(300) + 'a')).toThrow(/limit is 400/);
    expect(reject('('.repeat(60) + 'a' + ')'.repeat(60))).toThrow(/deeper than 40/);
    expect(reject('-'.repeat(100) + 'a')).toThrow(/deeper than 40/);
  });

  it('never generate code: the engine source holds no eval or new Function', () => {
    const files: string[] = [];
    const walk = (dir: string) => {
      for (const f of readdirSync(dir)) {
        const p = join(dir, f);
        if (statSync(p).isDirectory()) walk(p);
        else if (p.endsWith('.ts')) files.push(p);
      }
    };
    walk(join(__dirname, '../../shared'));
    expect(files.length).toBeGreaterThan(5);
    for (const f of files) {
      const text = readFileSync(f, 'utf8').replace(/\/\/.*$|\/\*[\s\S]*?\*\//gm, '');
      expect(text, f).not.toMatch(/new Function\s*\(|\beval\s*\(/);
    }
  });
});
