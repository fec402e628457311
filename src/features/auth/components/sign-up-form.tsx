import { useState, type FormEvent } from 'react';
import { signUpRequestSchema } from '../../../../shared/api/auth';
import { primaryButtonClass } from '../../../components/form-styles';
import { Notice } from '../../../components/notice';
import { TextField } from '../../../components/text-field';
import { fieldErrorsFromIssues, formErrorsFrom, withFieldName } from '../../../lib/form-errors';
import { useSignUp } from '../api/sign-up';
import { PasswordHint } from '../../../components/password-hint';

/** Name, e-mail and a new password; the server's answer is the same whether or not the address is known. */
export function SignUpForm({ onSignedUp }: { onSignedUp: (email: string) => void }) {
  const [name, setName] = useState('');
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const [showPassword, setShowPassword] = useState(false);
  const [localErrors, setLocalErrors] = useState<Record<string, string>>({});
  const signUp = useSignUp();
  const server = formErrorsFrom(signUp.error);
  const errors = { ...server.fields, ...localErrors };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const parsed = signUpRequestSchema.safeParse({ name, email, password });
    if (!parsed.success) {
      setLocalErrors(fieldErrorsFromIssues(parsed.error.issues));
      return;
    }
    setLocalErrors({});
    signUp.mutate(parsed.data, { onSuccess: (answer) => onSignedUp(answer.email) });
  };

  const hasFieldErrors = Object.keys(errors).length > 0;
  return (
    <form onSubmit={submit} noValidate className="grid gap-5" aria-label="Create an account">
      {signUp.isError && (
        <Notice tone="error" title="The account was not created">
          {hasFieldErrors ? 'Correct the marked fields and send the form again.' : server.summary}
        </Notice>
      )}
      <TextField label="Name" name="name" autoComplete="name" value={name} onChange={(e) => setName(e.target.value)} error={withFieldName('Name', errors.name)} required />
      <TextField
        label="E-mail"
        name="email"
        type="email"
        autoComplete="email"
        inputMode="email"
        value={email}
        onChange={(e) => setEmail(e.target.value)}
        error={withFieldName('E-mail', errors.email)}
        hint="We send a link to this address to confirm it is yours."
        required
      />
      <div>
        <TextField
          label="Password"
          name="password"
          type={showPassword ? 'text' : 'password'}
          autoComplete="new-password"
          value={password}
          onChange={(e) => setPassword(e.target.value)}
          error={withFieldName('Password', errors.password)}
          hint={<PasswordHint password={password} email={email} />}
          required
        />
        <label className="mt-2 inline-flex items-center gap-2 text-sm text-ink-800">
          <input type="checkbox" checked={showPassword} onChange={(e) => setShowPassword(e.target.checked)} className="size-4 accent-ink-700" />
          Show the password
        </label>
      </div>
      <button type="submit" className={primaryButtonClass} disabled={signUp.isPending}>
        {signUp.isPending ? 'Creating the account…' : 'Create the account'}
      </button>
    </form>
  );
}
