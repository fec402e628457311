import type { AuthoredInput } from '../../shared/spec/template-spec';

/**
 * The nominal design factor of a lifting device's design category. ASME BTH-1 gives
 * N_d = 2.00 for Design Category A (source seen) and 3.00 for Category B (from memory; confirm
 * in the edition that applies); ASME B30.20 asks for Category B unless a qualified person
 * shows that A is appropriate (source seen). The default is therefore 3.00.
 */
export const designFactorInput: AuthoredInput = {
  key: 'Nd',
  label: 'Nominal design factor',
  quantity: 'ratio',
  default: 3,
  min: 1,
  max: 6,
  step: 0.05,
  help: 'Design category factor N_d: ASME BTH-1 Category A 2.00, Category B 3.00 (B is the usual choice under ASME B30.20). Forces are shown at the rated load and multiplied by this factor.',
};

/** Rated load as a mass, the way lifting devices are marked. */
export const ratedLoadInput = (defaultKg: number, maxKg = 50000): AuthoredInput => ({
  key: 'm',
  label: 'Rated load',
  quantity: 'mass',
  default: defaultKg,
  min: 0,
  max: maxKg,
  step: 10,
  help: 'The rated load (working load limit) of the device, as a mass.',
});
