import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from '../../shared/api/auth';

export interface PasswordRule {
  label: string;
  met: boolean;
}

export type StrengthLevel = 0 | 1 | 2 | 3 | 4;

export interface PasswordStrength {
  rules: PasswordRule[];
  /** 0 nothing typed, 1 too weak to be accepted, 2 fair, 3 good, 4 strong. */
  level: StrengthLevel;
  word: string;
}

/**
 * The server's rules as a checklist, plus a rough guess of how hard the password is to guess:
 * length times the variety of characters, less for runs and repeats. The server has the last
 * word (it also refuses well-known weak passwords); this only helps while typing.
 */
export function passwordStrength(password: string, email = ''): PasswordStrength {
  const localPart = email.split('@')[0]?.trim().toLowerCase() ?? '';
  const distinct = new Set(password).size;
  const rules: PasswordRule[] = [
    { label: `At least ${PASSWORD_MIN_LENGTH} characters`, met: password.length >= PASSWORD_MIN_LENGTH && password.length <= PASSWORD_MAX_LENGTH },
    { label: 'At least 5 different characters', met: distinct >= 5 },
    {
      label: 'Does not contain the name part of your e-mail',
      met: password.length > 0 && (localPart.length < 3 || !password.toLowerCase().includes(localPart)),
    },
  ];
  if (!password) return { rules, level: 0, word: '' };
  if (rules.some((r) => !r.met)) return { rules, level: 1, word: 'Too weak' };

  let pool = 0;
  if (/[a-z]/.test(password)) pool += 26;
  if (/[A-Z]/.test(password)) pool += 26;
  if (/[0-9]/.test(password)) pool += 10;
  if (/[^a-zA-Z0-9]/.test(password)) pool += 33;
  // Repeated characters and simple runs add little: count them at a quarter.
  const repeats = password.length - distinct;
  const runs = [...password].filter((c, i) => i > 0 && Math.abs(c.charCodeAt(0) - password.charCodeAt(i - 1)) === 1).length;
  const effective = Math.max(1, password.length - 0.75 * (repeats + runs));
  const bits = effective * Math.log2(Math.max(pool, 2));
  const level: StrengthLevel = bits < 45 ? 2 : bits < 70 ? 3 : 4;
  return { rules, level, word: level === 2 ? 'Fair' : level === 3 ? 'Good' : 'Strong' };
}
