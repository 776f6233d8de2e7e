import { readCaughtMail } from './catcher.js';
import { escapeHtml } from './templates.js';

/** A plain page listing the messages the demo's mail catcher kept, newest first. */
export function demoMailPage(dir: string): string {
  const messages = readCaughtMail(dir);
  const items = messages
    .map(
      (m) => `<article><h2>${escapeHtml(m.subject)}</h2>
<p class="meta">To ${escapeHtml(m.to)} · ${escapeHtml(new Date(m.receivedAt).toLocaleString('en-GB'))}</p>
<pre>${escapeHtml(m.text).replace(/(https?:\/\/[^\s<]+)/g, '<a href="$1">$1</a>')}</pre></article>`,
    )
    .join('\n');
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1">
<title>Demo mail · Ferrule</title>
<style>body{font-family:system-ui,sans-serif;max-width:760px;margin:24px auto;padding:0 16px;color:#0b1220}
article{border:1px solid #cbd5e1;border-radius:8px;padding:12px 16px;margin:12px 0}h2{font-size:18px;margin:0 0 4px}
.meta{color:#475569;margin:0 0 8px;font-size:14px}pre{white-space:pre-wrap;font-family:inherit}a{color:#0f4c5c}</style></head>
<body><h1>Demo mail</h1><p>Messages Ferrule sent in demo mode. Nothing here left this machine.</p>
${items || '<p><strong>No messages yet.</strong> Invite a user or ask for a password reset to see one here.</p>'}
</body></html>`;
}
