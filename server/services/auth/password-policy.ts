import type { z } from 'zod';

// A short list of passwords that pass the length rule but are guessed first; the library's
// length limits still apply behind this.
const commonPasswords = new Set([
  'password123', 'password1234', 'passw0rd123', '1234567890', '12345678910', 'qwertyuiop', 'qwerty12345',
  'iloveyou123', 'letmein1234', 'welcome1234', 'administrator', 'abcdefghij', 'abc1234567', 'monkey12345',
  'football123', 'baseball123', 'dragon12345', 'sunshine123', 'princess123', 'trustno1234', 'pinwork123',
  'pinwork1234', 'changeme123', 'qwertyuiop1', '1q2w3e4r5t', 'zaq12wsxcde',
]);

/**
 * Extra password rules that need the rest of the request (the e-mail). Adds zod issues at
 * `field` so the problem names the field and the reason.
 */
export function checkPasswordStrength(ctx: z.RefinementCtx, password: string, email: string | undefined, field: string): void {
  const lower = password.toLowerCase();
  if (commonPasswords.has(lower)) {
    ctx.addIssue({ code: 'custom', path: [field], message: 'is one of the most common passwords; choose another' });
    return;
  }
  const local = email?.split('@')[0]?.toLowerCase();
  if (local && local.length >= 4 && lower.includes(local)) {
    ctx.addIssue({ code: 'custom', path: [field], message: 'must not contain your e-mail address' });
  }
}
