import type {
  CustomValidator,
  ErrorTransformer,
  RJSFSchema,
  RJSFValidationError,
  UiSchema,
  ValidationData,
  ValidatorType,
} from '@rjsf/utils';
// The precompiled validator by its own module: the package's index would pull in ajv's
// runtime compiler, which the CSP blocks and which the bundle does not need.
import createPrecompiledValidator from '@rjsf/validator-ajv8/lib/createPrecompiledValidator.js';
import type { ValidatorFunctions } from '@rjsf/validator-ajv8/lib/types.js';
import type { InputDef } from '../../../../shared/spec/template-spec';
import type { UnitSystem } from '../../../../shared/units/unit-systems';
import { displayBounds, engineValue } from '../../../lib/units/display-quantity';
import { formatInputValue } from '../../../lib/units/format-number';

export type FormValues = Record<string, number | string | undefined>;

/** A value being typed ("12.") is the number it already reads as; other text stays text. */
export function asNumber(v: number | string | undefined): number | string | undefined {
  if (typeof v !== 'string' || v.trim() === '') return v;
  const n = Number(v);
  return Number.isFinite(n) ? n : v;
}

/** Display values (as the form holds them) → engine units; text that is not a number stays text. */
export function toEngineValues(values: FormValues, inputs: readonly InputDef[], system: UnitSystem): FormValues {
  const out: FormValues = {};
  for (const input of inputs) {
    const v = asNumber(values[input.key]);
    out[input.key] = typeof v === 'number' && Number.isFinite(v) ? engineValue(v, input, system) : v;
  }
  return out;
}

/**
 * RJSF's precompiled validator, checking the values in engine units. The functions were
 * compiled from the engine-unit schema, so the form's display values are converted to a
 * copy first, and each message is worded again in the visitor's units.
 */
export function engineUnitsValidator(
  validateFns: ValidatorFunctions,
  rootSchema: RJSFSchema,
  inputs: readonly InputDef[],
  system: UnitSystem,
): ValidatorType<FormValues> {
  const inner = createPrecompiledValidator<FormValues>(validateFns, rootSchema);
  const byKey = new Map(inputs.map((i) => [i.key, i]));

  const reword: ErrorTransformer<FormValues> = (errors) => {
    const seen = new Set<string>();
    const out: RJSFValidationError[] = [];
    for (const error of errors) {
      const key = error.property?.replace(/^\./, '') ?? '';
      const input = byKey.get(key);
      const message = input ? messageFor(error, input, system) : error.message;
      // A choice out of its list fails every `const` and the `anyOf`: say it once.
      if (seen.has(`${key}:${message}`)) continue;
      seen.add(`${key}:${message}`);
      out.push({ ...error, message, stack: `${input?.label ?? key} ${message}` });
    }
    return out;
  };

  const requireEvery: CustomValidator<FormValues> = (formData, errors) => {
    for (const input of inputs) {
      const v = formData?.[input.key];
      if (v === undefined || v === '') errors[input.key]?.addError('Enter a value.');
    }
    return errors;
  };

  return {
    validateFormData(
      formData: FormValues | undefined,
      schema: RJSFSchema,
      customValidate?: CustomValidator<FormValues>,
      transformErrors?: ErrorTransformer<FormValues>,
      uiSchema?: UiSchema<FormValues>,
    ): ValidationData<FormValues> {
      const engine = toEngineValues(formData ?? {}, inputs, system);
      const custom: CustomValidator<FormValues> = (data, errors, ui) => {
        const checked = requireEvery(data, errors, ui);
        return customValidate ? customValidate(data, checked, ui) : checked;
      };
      const transform: ErrorTransformer<FormValues> = (errors, ui) => {
        const worded = reword(errors, ui);
        return transformErrors ? transformErrors(worded, ui) : worded;
      };
      return inner.validateFormData(engine, schema, custom, transform, uiSchema);
    },
    isValid(schema, formData, root) {
      // Only called by RJSF to pick among alternatives (the choice inputs), which carry no unit.
      return inner.isValid(schema, formData, root);
    },
    rawValidation(schema, formData) {
      return inner.rawValidation(schema, toEngineValues(formData ?? {}, inputs, system));
    },
  };
}

function messageFor(error: RJSFValidationError, input: InputDef, system: UnitSystem): string {
  const { min, max, unit } = displayBounds(input, system);
  const withUnit = (v: number) => `${formatInputValue(v)}${unit ? ` ${unit}` : ''}`;
  switch (error.name) {
    case 'minimum':
    case 'exclusiveMinimum':
      return `Must be at least ${withUnit(min)} (allowed: ${withUnit(min)} to ${withUnit(max)}).`;
    case 'maximum':
    case 'exclusiveMaximum':
      return `Must be at most ${withUnit(max)} (allowed: ${withUnit(min)} to ${withUnit(max)}).`;
    case 'type':
      return 'Enter a number, such as 12 or 0.5.';
    case 'const':
    case 'anyOf':
    case 'enum':
      return 'Choose one of the listed options.';
    default:
      return error.message ? `${error.message[0]?.toUpperCase() ?? ''}${error.message.slice(1)}.` : 'This value is not accepted.';
  }
}
