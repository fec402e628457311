import type { OutgoingMail } from './mail-queue';

// Our own plain style: one column, the product's slate and amber, no images or remote assets,
// so a message reads the same in every client and offline. Every message has a text part.

interface MessageParts {
  to: string;
  purpose: string;
  subject: string;
  greeting: string;
  lines: string[];
  action?: { label: string; url: string };
  after?: string[];
}

function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}

function compose(parts: MessageParts): OutgoingMail {
  const paragraph = (line: string) => `<p style="margin:0 0 14px;line-height:1.55">${escapeHtml(line)}</p>`;
  const button = parts.action
    ? `<p style="margin:22px 0"><a href="${escapeHtml(parts.action.url)}" style="display:inline-block;background:#b45309;color:#ffffff;text-decoration:none;font-weight:600;padding:11px 20px;border-radius:6px">${escapeHtml(parts.action.label)}</a></p>
<p style="margin:0 0 14px;font-size:13px;color:#475569">If the button does not open, copy this address into your browser:<br><span style="word-break:break-all">${escapeHtml(parts.action.url)}</span></p>`
    : '';
  const html = `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width"><title>${escapeHtml(parts.subject)}</title></head>
<body style="margin:0;background:#f1f5f9;font-family:Manrope,Segoe UI,Helvetica,Arial,sans-serif;color:#0f172a">
<div style="max-width:560px;margin:0 auto;padding:28px 16px">
<div style="font-weight:700;font-size:18px;letter-spacing:.02em;color:#1e293b;margin-bottom:14px">Pinwork <span style="color:#b45309">&#9679;</span></div>
<div style="background:#ffffff;border:1px solid #cbd5e1;border-radius:8px;padding:24px">
${paragraph(parts.greeting)}
${parts.lines.map(paragraph).join('\n')}
${button}
${(parts.after ?? []).map(paragraph).join('\n')}
</div>
<p style="font-size:12px;color:#64748b;margin:16px 4px">Pinwork works out the forces in pins, links and jaws. You receive this message because of an action on your Pinwork account.</p>
</div></body></html>`;
  const text = [
    parts.greeting,
    '',
    ...parts.lines.flatMap((line) => [line, '']),
    ...(parts.action ? [`${parts.action.label}: ${parts.action.url}`, ''] : []),
    ...(parts.after ?? []).flatMap((line) => [line, '']),
    '-- ',
    'Pinwork: forces in pins, links and jaws. You receive this message because of an action on your Pinwork account.',
  ].join('\n');
  return { to: parts.to, purpose: parts.purpose, subject: parts.subject, html, text };
}

export function verifyEmailMessage(to: string, name: string, url: string): OutgoingMail {
  return compose({
    to,
    purpose: 'verify-email',
    subject: 'Confirm your e-mail address for Pinwork',
    greeting: `Hello ${name},`,
    lines: ['Thanks for signing up. One step is left: confirm that this address is yours, then sign in.'],
    action: { label: 'Confirm my address', url },
    after: ['The link works for 24 hours. If you did not sign up, ignore this message and nothing happens.'],
  });
}

export function alreadyRegisteredMessage(to: string, name: string, signInUrl: string, resetUrl: string): OutgoingMail {
  return compose({
    to,
    purpose: 'already-registered',
    subject: 'You already have a Pinwork account',
    greeting: `Hello ${name},`,
    lines: [
      'Someone, perhaps you, tried to sign up to Pinwork with this address. It already has an account, so nothing was changed.',
      `To get in, sign in at ${signInUrl}. Forgot the password? Choose a new one:`,
    ],
    action: { label: 'Choose a new password', url: resetUrl },
    after: ['If it was not you, you can ignore this message: your account is unchanged.'],
  });
}

export function resetPasswordMessage(to: string, name: string, url: string): OutgoingMail {
  return compose({
    to,
    purpose: 'reset-password',
    subject: 'Choose a new Pinwork password',
    greeting: `Hello ${name},`,
    lines: ['We received a request to choose a new password for your Pinwork account.'],
    action: { label: 'Choose a new password', url },
    after: [
      'The link works once, for one hour. Choosing a new password signs you out everywhere.',
      'If you did not ask for this, ignore this message: your password stays as it is.',
    ],
  });
}

export function invitationMessage(to: string, inviter: string, organisation: string, role: string, url: string): OutgoingMail {
  return compose({
    to,
    purpose: 'invitation',
    subject: `${inviter} invites you to ${organisation} on Pinwork`,
    greeting: 'Hello,',
    lines: [`${inviter} invites you to join ${organisation} on Pinwork as ${role === 'owner' ? 'an owner' : 'a member'}.`],
    action: { label: `Join ${organisation}`, url },
    after: ['The invitation works once, for 7 days. Sign in (or sign up) with this address to accept it.'],
  });
}
