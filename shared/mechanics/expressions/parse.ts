import jsep from 'jsep';

/**
 * Expressions are parsed by jsep (a small, widely used JavaScript expression parser) into a
 * syntax tree; ./compile.ts turns the whitelisted part of that tree into closures over plain
 * numbers. Nothing is ever handed to eval or new Function, so authored expressions cannot run
 * code and the browser's Content-Security-Policy can forbid 'unsafe-eval'.
 */

// `^` means power here (as engineers write it), not XOR; bitwise operators are not allowed at
// all, so remove them from the grammar rather than reject them later with a vaguer message.
jsep.removeBinaryOp('^');
jsep.addBinaryOp('^', 11, true);
for (const op of ['|', '&', '<<', '>>', '>>>', '===', '!==']) jsep.removeBinaryOp(op);
jsep.removeUnaryOp('~');

export type Node = jsep.Expression;

export const MAX_EXPRESSION_LENGTH = 400;
export const MAX_EXPRESSION_DEPTH = 40;

export class ExpressionError extends Error {
  constructor(
    message: string,
    readonly source: string,
  ) {
    super(message);
    this.name = 'ExpressionError';
  }
}

export function parseExpression(source: string): Node {
  if (typeof source !== 'string') throw new ExpressionError('an expression must be text', String(source));
  if (source.length > MAX_EXPRESSION_LENGTH) {
    throw new ExpressionError(`is ${source.length} characters long; the limit is ${MAX_EXPRESSION_LENGTH}`, source.slice(0, 40) + '…');
  }
  if (source.trim() === '') throw new ExpressionError('is empty', source);
  // Cheap guard before the recursive parser sees a pathological nesting.
  let depth = 0;
  for (const ch of source) {
    if (ch === '(' || ch === '[') depth++;
    else if (ch === ')' || ch === ']') depth--;
    if (depth > MAX_EXPRESSION_DEPTH) {
      throw new ExpressionError(`nests brackets deeper than ${MAX_EXPRESSION_DEPTH} levels`, source.slice(0, 40) + '…');
    }
  }
  try {
    return jsep(source);
  } catch (err) {
    const reason = err instanceof Error ? err.message : String(err);
    throw new ExpressionError(`cannot be read: ${reason}`, source);
  }
}
