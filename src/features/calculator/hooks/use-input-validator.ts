import { useQuery } from '@tanstack/react-query';
import type { RJSFSchema, ValidatorType } from '@rjsf/utils';
import { useMemo } from 'react';
import type { InputDef } from '../../../../shared/spec/template-spec';
import type { UnitSystem } from '../../../../shared/units/unit-systems';
import { engineUnitsValidator, type FormValues } from '../form/engine-units-validator';
import { loadInputValidator } from '../form/load-input-validator';

/** Accepts everything: used only until (or if never) the precompiled validator arrives. */
const acceptAll: ValidatorType<FormValues> = {
  validateFormData: () => ({ errors: [], errorSchema: {} }),
  isValid: () => true,
  rawValidation: () => ({ errors: [] }),
};

export function useInputValidator(
  validatorUrl: string,
  contentHash: string,
  schema: RJSFSchema,
  inputs: readonly InputDef[],
  system: UnitSystem,
) {
  const fns = useQuery({
    queryKey: ['input-validator', contentHash],
    queryFn: () => loadInputValidator(validatorUrl, contentHash),
    staleTime: Infinity,
    gcTime: Infinity,
    retry: 1,
  });
  const validator = useMemo(
    () => (fns.data ? engineUnitsValidator(fns.data, schema, inputs, system) : acceptAll),
    [fns.data, schema, inputs, system],
  );
  return { validator, ready: fns.isSuccess, failed: fns.isError };
}
