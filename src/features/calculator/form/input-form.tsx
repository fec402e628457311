import Form from '@rjsf/core';
import type { ErrorSchema, RJSFSchema, UiSchema } from '@rjsf/utils';
import { useMemo } from 'react';
import type { InputDef } from '../../../../shared/spec/template-spec';
import { unitOf, type UnitSystem } from '../../../../shared/units/unit-systems';
import { displayBounds } from '../../../lib/units/display-quantity';
import { ChoiceField } from './choice-field';
import { ChoiceWidget } from './choice-widget';
import type { FormValues } from './engine-units-validator';
import type { FieldOptions } from './field-options';
import { FieldTemplate, ObjectFieldTemplate } from './form-templates';
import { SliderWidget } from './slider-widget';
import { UnitNumberWidget } from './unit-number-widget';
import type { ValidatorType } from '@rjsf/utils';

const widgets = { unitNumber: UnitNumberWidget, slider: SliderWidget, choice: ChoiceWidget };
const templates = { FieldTemplate, ObjectFieldTemplate };
const fields = { choice: ChoiceField };

function uiSchemaFor(inputs: readonly InputDef[], system: UnitSystem): UiSchema<FormValues> {
  const ui: UiSchema<FormValues> = { 'ui:submitButtonOptions': { norender: true } };
  for (const input of inputs) {
    const { min, max, step, unit } = displayBounds(input, system);
    const options: FieldOptions = { unit: unit || unitOf(input.quantity, system), min, max, step, help: input.help };
    if (input.control === 'choice' && input.choices) options.choices = input.choices;
    ui[input.key] = {
      ...(input.control === 'choice' ? { 'ui:field': 'choice' } : { 'ui:widget': input.control === 'slider' ? 'slider' : 'unitNumber' }),
      'ui:title': input.label,
      'ui:options': { ...options },
    };
  }
  return ui;
}

export interface InputFormProps {
  schema: RJSFSchema;
  inputs: readonly InputDef[];
  system: UnitSystem;
  /** Display units. */
  values: FormValues;
  onChange: (values: FormValues) => void;
  validator: ValidatorType<FormValues>;
  /** Messages from the server, by input key, shown beside the field like the validator's. */
  serverErrors: Record<string, string[]>;
}

/**
 * The template's inputs as a form drawn by RJSF from the version's JSON Schema, with our own
 * widgets; validated as the visitor types by the precompiled validator.
 */
export function InputForm({ schema, inputs, system, values, onChange, validator, serverErrors }: InputFormProps) {
  const uiSchema = useMemo(() => uiSchemaFor(inputs, system), [inputs, system]);
  const extraErrors = useMemo(() => {
    const out: Record<string, { __errors: string[] }> = {};
    for (const [key, messages] of Object.entries(serverErrors)) out[key] = { __errors: messages };
    return out as ErrorSchema<FormValues>;
  }, [serverErrors]);
  return (
    <Form<FormValues>
      // A new validator (another unit system) words its messages anew: start the form afresh.
      key={system}
      schema={schema}
      uiSchema={uiSchema}
      formData={values}
      validator={validator}
      widgets={widgets}
      fields={fields}
      templates={templates}
      liveValidate="onChange"
      showErrorList={false}
      noHtml5Validate
      extraErrors={extraErrors}
      onChange={(event) => onChange(event.formData ?? {})}
      onSubmit={() => undefined}
      className="grid gap-5"
    />
  );
}
