/**
 * The calculator form validates with RJSF's precompiled validator, because the runtime ajv
 * compiler needs eval, which the Content-Security-Policy forbids. The code is generated here,
 * once per version (at publish or seed), stored with it and served as a same-origin script
 * that registers the validator functions under the version's content hash. The compiler (ajv)
 * loads on first use: a restart that finds every version stored never needs it.
 */
export async function inputValidatorScript(inputSchema: Record<string, unknown>, hash: string): Promise<string> {
  const { compileSchemaValidatorsCode } = await import('@rjsf/validator-ajv8/compileSchemaValidators');
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
