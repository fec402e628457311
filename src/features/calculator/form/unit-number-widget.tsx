import { ariaDescribedByIds, type WidgetProps } from '@rjsf/utils';
import { fieldOptions } from './field-options';
import { useTypedText } from './use-typed-text';

export const fieldInputClass =
  'w-full min-w-0 rounded-lg border bg-paper-50 px-3 py-2 text-base text-ink-950 tabular-nums shadow-inner focus:border-ink-500 aria-invalid:border-verdict-fail aria-invalid:bg-signal-50';

/**
 * A number with its unit beside it. Plain text with a decimal keyboard rather than
 * type=number, so the browser neither refuses nor silently clamps a value: the validator says
 * what is wrong, in words, beside the field.
 */
export function UnitNumberWidget(props: WidgetProps) {
  const { id, value, onChange, onBlur, onFocus, disabled, readonly, rawErrors } = props;
  const { unit } = fieldOptions(props.options);
  const [text, setText] = useTypedText(value);
  const invalid = (rawErrors?.length ?? 0) > 0;
  return (
    <div className="flex items-stretch">
      <input
        id={id}
        name={id}
        type="text"
        inputMode="decimal"
        autoComplete="off"
        spellCheck={false}
        value={text}
        disabled={disabled || readonly}
        aria-invalid={invalid || undefined}
        aria-describedby={ariaDescribedByIds(id)}
        onChange={(e) => {
          setText(e.target.value);
          onChange(e.target.value.trim() === '' ? undefined : e.target.value.trim());
        }}
        onBlur={(e) => onBlur(id, e.target.value)}
        onFocus={(e) => onFocus(id, e.target.value)}
        className={`${fieldInputClass} ${unit ? 'rounded-r-none' : ''} ${invalid ? 'border-verdict-fail' : 'border-ink-200'}`}
      />
      {unit && (
        <span className="flex min-w-12 items-center justify-center rounded-r-lg border border-l-0 border-ink-200 bg-ink-50 px-2.5 text-sm font-semibold text-ink-700">
          {unit}
        </span>
      )}
    </div>
  );
}
