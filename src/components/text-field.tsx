import { useId, type InputHTMLAttributes, type ReactNode } from 'react';
import { inputClass } from './form-styles';

interface TextFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'id' | 'className'> {
  label: string;
  /** The server's or the form's message for this field; shown beside it and linked to it. */
  error?: string;
  hint?: ReactNode;
}

/** A labelled input whose hint and error are announced with it (aria-describedby). */
export function TextField({ label, error, hint, ...input }: TextFieldProps) {
  const id = useId();
  const hintId = `${id}-hint`;
  const errorId = `${id}-error`;
  const describedBy = [hint ? hintId : null, error ? errorId : null].filter(Boolean).join(' ') || undefined;
  return (
    <div>
      <label htmlFor={id} className="block text-sm font-bold text-ink-900">
        {label}
      </label>
      <input
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className={`${inputClass} mt-1.5`}
        {...input}
      />
      {error && <FieldError id={errorId}>{error}</FieldError>}
      {hint && (
        <div id={hintId} className="mt-1.5 text-sm text-ink-700">
          {hint}
        </div>
      )}
    </div>
  );
}

/** A field's error: a mark and words, so colour is not the only sign. */
export function FieldError({ id, children }: { id?: string; children: ReactNode }) {
  return (
    <p id={id} className="mt-1.5 flex items-start gap-1.5 text-sm font-semibold text-verdict-fail">
      <span aria-hidden="true" className="mt-0.5 inline-flex size-4 shrink-0 items-center justify-center rounded-full bg-verdict-fail text-[0.6rem] text-paper-50">
        ✕
      </span>
      <span>{children}</span>
    </p>
  );
}
