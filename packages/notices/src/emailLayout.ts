import escapeHtml from 'escape-html';

export interface EmailParts {
  subject: string;
  text: string;
  html: string;
}

/** Wraps paragraphs and one call to action in Kerfmark's plain e-mail layout (text and HTML). */
export function emailLayout(opts: {
  subject: string;
  greeting: string;
  paragraphs: string[];
  action: { label: string; url: string };
  footer: string;
}): EmailParts {
  const text = [
    opts.greeting,
    '',
    ...opts.paragraphs.flatMap((p) => [p, '']),
    `${opts.action.label}: ${opts.action.url}`,
    '',
    '—',
    opts.footer,
  ].join('\n');
  const html = `<!doctype html><html><body style="margin:0;background:#f4f6f5;font-family:'Work Sans',Arial,sans-serif;color:#1f2a2e">
<table role="presentation" width="100%" cellpadding="0" cellspacing="0"><tr><td align="center" style="padding:32px 16px">
<table role="presentation" width="560" cellpadding="0" cellspacing="0" style="background:#ffffff;border-radius:8px;padding:32px">
<tr><td style="font-size:20px;font-weight:600;color:#1d5c63;padding-bottom:16px">Kerfmark</td></tr>
<tr><td style="font-size:15px;line-height:1.55"><p>${escapeHtml(opts.greeting)}</p>
${opts.paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`).join('\n')}
<p style="padding:8px 0"><a href="${escapeHtml(opts.action.url)}" style="background:#1d5c63;color:#ffffff;text-decoration:none;padding:10px 18px;border-radius:6px;display:inline-block">${escapeHtml(opts.action.label)}</a></p>
<p style="font-size:12px;color:#5b6b70">${escapeHtml(opts.footer)}</p></td></tr>
</table></td></tr></table></body></html>`;
  return { subject: opts.subject, text, html };
}
