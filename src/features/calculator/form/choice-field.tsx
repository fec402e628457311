import type { FieldProps, WidgetProps } from '@rjsf/utils';
import { ChoiceWidget } from './choice-widget';

/**
 * A choice input's schema is an anyOf of constants (zod's union of literals), which RJSF
 * would draw as a schema switcher; as a field of our own it is one plain select.
 */
export function ChoiceField(props: FieldProps) {
  const { fieldPathId, formData, onChange, onBlur, onFocus, uiSchema, rawErrors, registry, schema, disabled, readonly, name } = props;
  return (
    <ChoiceWidget
      id={fieldPathId.$id}
      name={name}
      value={formData}
      label={String(uiSchema?.['ui:title'] ?? name)}
      schema={schema}
      options={{ ...(uiSchema?.['ui:options'] as object | undefined) } as WidgetProps['options']}
      onChange={(v: unknown) => onChange(v, fieldPathId.path)}
      onBlur={onBlur}
      onFocus={onFocus}
      registry={registry}
      rawErrors={rawErrors}
      disabled={disabled}
      readonly={readonly}
    />
  );
}
