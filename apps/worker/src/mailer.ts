import nodemailer from 'nodemailer';

/** SMTP transport from SMTP_URL; the local catcher speaks plain SMTP on loopback. */
export function createMailer(smtpUrl: string) {
  const url = new URL(smtpUrl);
  const local = url.protocol === 'smtp:' && ['127.0.0.1', 'localhost'].includes(url.hostname);
  return nodemailer.createTransport({
    host: url.hostname,
    port: Number(url.port || 25),
    secure: url.protocol === 'smtps:',
    ignoreTLS: local,
    auth: url.username ? { user: decodeURIComponent(url.username), pass: decodeURIComponent(url.password) } : undefined,
    connectionTimeout: 5000,
    greetingTimeout: 5000,
    socketTimeout: 10_000,
  });
}
export type Mailer = ReturnType<typeof createMailer>;
