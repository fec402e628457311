import { ariaDescribedByIds, type WidgetProps } from '@rjsf/utils';
import { formatInputValue } from '../../../lib/units/format-number';
import { fieldOptions } from './field-options';
import { fieldInputClass } from './unit-number-widget';
import { useTypedText } from './use-typed-text';

/** A range input for inputs whose range is natural to slide through, with a box to type in. */
export function SliderWidget(props: WidgetProps) {
  const { id, value, onChange, onBlur, onFocus, disabled, readonly, rawErrors, label } = props;
  const { unit, min, max, step } = fieldOptions(props.options);
  const [text, setText] = useTypedText(value);
  const invalid = (rawErrors?.length ?? 0) > 0;
  const numeric = typeof value === 'number' && Number.isFinite(value) ? Math.min(max, Math.max(min, value)) : min;
  return (
    <div className="flex items-center gap-3">
      <input
        id={id}
        name={id}
        type="range"
        min={min}
        max={max}
        step={step}
        value={numeric}
        disabled={disabled || readonly}
        aria-describedby={ariaDescribedByIds(id)}
        aria-valuetext={`${formatInputValue(numeric)}${unit ? ` ${unit}` : ''}`}
        onChange={(e) => {
          setText(e.target.value);
          onChange(Number(e.target.value));
        }}
        onBlur={() => onBlur(id, value)}
        onFocus={() => onFocus(id, value)}
        className="h-2 min-w-0 flex-1 cursor-pointer accent-ink-600"
      />
      <div className="flex w-32 shrink-0 items-stretch">
        <input
          id={`${id}__typed`}
          type="text"
          inputMode="decimal"
          autoComplete="off"
          aria-label={`${label}${unit ? `, in ${unit}` : ''}`}
          aria-invalid={invalid || undefined}
          aria-describedby={ariaDescribedByIds(id)}
          value={text}
          disabled={disabled || readonly}
          onChange={(e) => {
            setText(e.target.value);
            onChange(e.target.value.trim() === '' ? undefined : e.target.value.trim());
          }}
          className={`${fieldInputClass} ${unit ? 'rounded-r-none' : ''} px-2 ${invalid ? 'border-verdict-fail' : 'border-ink-200'}`}
        />
        {unit && (
          <span className="flex min-w-9 items-center justify-center rounded-r-lg border border-l-0 border-ink-200 bg-ink-50 px-1.5 text-sm font-semibold text-ink-700">
            {unit}
          </span>
        )}
      </div>
    </div>
  );
}
