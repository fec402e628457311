import { passwordStrength } from './password-strength';

const barColours = ['bg-ink-100', 'bg-verdict-fail', 'bg-verdict-warn', 'bg-ink-500', 'bg-verdict-pass'] as const;

/** The rules ticked off while typing, and a four-step strength bar that also says its level in words. */
export function PasswordHint({ password, email }: { password: string; email?: string }) {
  const strength = passwordStrength(password, email);
  return (
    <div className="mt-1" data-password-strength={strength.level}>
      <div className="flex items-center gap-3">
        <div className="grid flex-1 grid-cols-4 gap-1" aria-hidden="true">
          {[1, 2, 3, 4].map((step) => (
            <span key={step} className={`h-1.5 rounded-full ${strength.level >= step ? barColours[strength.level] : 'bg-ink-100'}`} />
          ))}
        </div>
        <span className="shrink-0 text-right text-xs font-bold text-ink-800" aria-live="polite">
          {strength.word ? `Strength: ${strength.word}` : ''}
        </span>
      </div>
      <ul className="mt-2 grid gap-1 text-sm">
        {strength.rules.map((rule) => (
          <li key={rule.label} className={`flex items-center gap-2 ${rule.met ? 'text-ink-900' : 'text-ink-700'}`}>
            <span
              aria-hidden="true"
              className={`inline-flex size-4 shrink-0 items-center justify-center rounded-full text-[0.6rem] font-extrabold ${rule.met ? 'bg-verdict-pass text-paper-50' : 'border border-ink-300 text-ink-500'}`}
            >
              {rule.met ? '✓' : ''}
            </span>
            {rule.label}
            <span className="sr-only">{rule.met ? ' (met)' : ' (not yet met)'}</span>
          </li>
        ))}
      </ul>
      <p className="mt-1.5 text-xs text-ink-700">A few unrelated words make a long password that is easy to remember.</p>
    </div>
  );
}
