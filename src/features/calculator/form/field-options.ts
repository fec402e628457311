/** What our widgets read from `ui:options`, built per input from the spec and the unit system. */
export interface FieldOptions {
  unit: string;
  min: number;
  max: number;
  step: number;
  help: string;
  choices?: { value: number; label: string }[];
}

export function fieldOptions(options: unknown): FieldOptions {
  return options as FieldOptions;
}
