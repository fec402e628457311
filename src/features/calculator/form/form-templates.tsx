import { errorId, helpId, type FieldTemplateProps, type ObjectFieldTemplateProps } from '@rjsf/utils';
import { fieldOptions } from './field-options';

/** Label, control, the field's own errors (beside it, in words) and its help. */
export function FieldTemplate(props: FieldTemplateProps) {
  const { id, label, children, rawErrors = [], hidden, uiSchema, schema } = props;
  if (hidden) return <div className="hidden">{children}</div>;
  // The root object: just its fields.
  if (schema.type === 'object') return <>{children}</>;
  const { help, min, max, unit } = fieldOptions(uiSchema?.['ui:options'] ?? {});
  const range = Number.isFinite(min) && Number.isFinite(max) && max > min;
  return (
    <div className="flex flex-col gap-1.5" data-field={id}>
      <label htmlFor={id} className="text-sm font-bold text-ink-900">
        {label}
      </label>
      {children}
      <div id={errorId(id)} aria-live="polite">
        {rawErrors.map((message) => (
          <p key={message} className="flex items-start gap-1.5 text-sm font-semibold text-verdict-fail">
            <span aria-hidden="true" className="mt-0.5 inline-flex size-4 shrink-0 items-center justify-center rounded-full bg-verdict-fail text-[0.65rem] font-extrabold text-paper-50">
              !
            </span>
            <span>{message}</span>
          </p>
        ))}
      </div>
      <p id={helpId(id)} className="text-xs leading-relaxed text-ink-700">
        {help}
        {range && !uiSchema?.['ui:options']?.choices && (
          <span className="text-ink-600">
            {help ? ' ' : ''}Range {fmt(min)} to {fmt(max)}
            {unit ? ` ${unit}` : ''}.
          </span>
        )}
      </p>
    </div>
  );
}

function fmt(v: number): string {
  return String(Number(v.toPrecision(5)));
}

export function ObjectFieldTemplate(props: ObjectFieldTemplateProps) {
  return <div className="grid gap-5">{props.properties.map((p) => p.content)}</div>;
}
