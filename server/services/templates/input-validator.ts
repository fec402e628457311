import { compileSchemaValidatorsCode } from '@rjsf/validator-ajv8/compileSchemaValidators';

/**
 * The calculator form validates with RJSF's precompiled validator, because the runtime ajv
 * compiler needs eval, which the Content-Security-Policy forbids. The code is generated here,
 * once per version (at publish or seed), stored with it and served as a same-origin script
 * that registers the validator functions under the version's content hash.
 */
export function inputValidatorScript(inputSchema: Record<string, unknown>, hash: string): string {
  const code = compileSchemaValidatorsCode(inputSchema as never);
  return [
    '(function () {',
    '  var exports = {};',
    code,
    '  var registry = self.pinworkInputValidators || (self.pinworkInputValidators = {});',
    `  registry[${JSON.stringify(hash)}] = exports;`,
    '})();',
    '',
  ].join('\n');
}
