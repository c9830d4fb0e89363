import type { CaughtMessage } from './store';

const escape = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

const page = (title: string, body: string) => `<!doctype html><html><head><meta charset="utf-8">
<title>${escape(title)}</title><style>
body{font-family:system-ui,sans-serif;margin:0;background:#f4f6f5;color:#1f2a2e}
header{background:#1d5c63;color:#fff;padding:12px 24px;font-weight:600}
main{max-width:960px;margin:24px auto;padding:0 16px}
table{width:100%;border-collapse:collapse;background:#fff}
td,th{padding:8px 12px;border-bottom:1px solid #e3e8e6;text-align:left;font-size:14px}
a{color:#1d5c63}pre{white-space:pre-wrap;background:#fff;padding:16px;border-radius:6px}
iframe{width:100%;height:560px;border:1px solid #e3e8e6;background:#fff}
</style></head><body><header>Kerfmark local mail catcher · nothing here leaves this machine</header><main>${body}</main></body></html>`;

export function renderInbox(messages: CaughtMessage[]): string {
  const rows = messages
    .map(
      (m) =>
        `<tr><td>${escape(new Date(m.receivedAt).toLocaleString())}</td><td>${escape(m.to.join(', '))}</td><td><a href="/messages/${m.id}">${escape(m.subject || '(no subject)')}</a></td></tr>`,
    )
    .join('');
  return page(
    'Inbox',
    messages.length
      ? `<table><tr><th>Received</th><th>To</th><th>Subject</th></tr>${rows}</table>`
      : '<p>No e-mail caught yet.</p>',
  );
}

export function renderMessage(m: CaughtMessage): string {
  // The HTML part is shown in a sandboxed frame: no scripts, no same-origin access.
  const html = m.html ? `<h3>HTML</h3><iframe sandbox srcdoc="${escape(m.html)}"></iframe>` : '';
  return page(
    m.subject,
    `<p><a href="/">← Inbox</a></p><h2>${escape(m.subject)}</h2><p>From ${escape(m.from)} to ${escape(m.to.join(', '))}</p>
<h3>Plain text</h3><pre>${escape(m.text)}</pre>${html}`,
  );
}
