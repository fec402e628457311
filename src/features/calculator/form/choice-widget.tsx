import { ariaDescribedByIds, type WidgetProps } from '@rjsf/utils';
import { fieldOptions } from './field-options';
import { fieldInputClass } from './unit-number-widget';

/** A select for an input that takes one of a few listed values. */
export function ChoiceWidget(props: WidgetProps) {
  const { id, value, onChange, onBlur, onFocus, disabled, readonly, rawErrors } = props;
  const { choices = [] } = fieldOptions(props.options);
  const invalid = (rawErrors?.length ?? 0) > 0;
  const index = choices.findIndex((c) => c.value === value);
  return (
    <select
      id={id}
      name={id}
      value={index < 0 ? '' : String(index)}
      disabled={disabled || readonly}
      aria-invalid={invalid || undefined}
      aria-describedby={ariaDescribedByIds(id)}
      onChange={(e) => onChange(choices[Number(e.target.value)]?.value)}
      onBlur={() => onBlur(id, value)}
      onFocus={() => onFocus(id, value)}
      className={`${fieldInputClass} ${invalid ? 'border-verdict-fail' : 'border-ink-200'}`}
    >
      {index < 0 && <option value="">Choose…</option>}
      {choices.map((c, i) => (
        <option key={c.value} value={String(i)}>
          {c.label}
        </option>
      ))}
    </select>
  );
}
