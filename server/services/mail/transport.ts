import nodemailer, { type Transporter } from 'nodemailer';

/** nodemailer over SMTP. Plain smtp:// to loopback gets no TLS (the dev server offers none). */
export function smtpTransport(smtpUrl: string): Transporter {
  const url = new URL(smtpUrl);
  const secure = url.protocol === 'smtps:';
  const loopback = ['127.0.0.1', 'localhost', '[::1]'].includes(url.hostname);
  return nodemailer.createTransport({
    host: url.hostname.replace(/^\[|\]$/g, ''),
    port: url.port ? Number(url.port) : secure ? 465 : 587,
    secure,
    ignoreTLS: loopback && !secure,
    auth: url.username ? { user: decodeURIComponent(url.username), pass: decodeURIComponent(url.password) } : undefined,
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 20_000,
  });
}
