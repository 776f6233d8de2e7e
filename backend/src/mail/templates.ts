/** Escapes text for HTML, so a name like `<b>` arrives as text. */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] ?? c);
}

interface LinkMail {
  subject: string;
  text: string;
  html: string;
}

function layout(title: string, paragraphs: string[], link: string, button: string): string {
  const body = paragraphs.map((p) => `<p style="margin:0 0 16px">${p}</p>`).join('');
  return `<!doctype html><html><body style="font-family:sans-serif;color:#0f172a;max-width:560px">
<h1 style="font-size:20px">${escapeHtml(title)}</h1>${body}
<p><a href="${escapeHtml(link)}" style="display:inline-block;background:#0f3d3e;color:#fff;padding:12px 20px;border-radius:6px;text-decoration:none">${escapeHtml(button)}</a></p>
<p style="font-size:13px;color:#475569">Or paste this address into your browser: ${escapeHtml(link)}</p>
</body></html>`;
}

export function invitationMail(args: { name: string; invitedBy: string; companyName: string; link: string; hours: number }): LinkMail {
  const subject = `You are invited to Ferrule${args.companyName ? ` for ${args.companyName}` : ''}`;
  const text = `Hello ${args.name},

${args.invitedBy} has invited you to Ferrule, where ${args.companyName || 'your plant'} keeps its hose register.

Choose your password here (the link works once, for ${args.hours} hours):
${args.link}
`;
  const html = layout(
    subject,
    [
      `Hello ${escapeHtml(args.name)},`,
      `${escapeHtml(args.invitedBy)} has invited you to Ferrule, where ${escapeHtml(args.companyName || 'your plant')} keeps its hose register.`,
      `The link works once, for ${args.hours} hours.`,
    ],
    args.link,
    'Choose your password',
  );
  return { subject, text, html };
}

export function resetMail(args: { name: string; link: string; minutes: number }): LinkMail {
  const subject = 'Reset your Ferrule password';
  const text = `Hello ${args.name},

Someone asked to reset the password of your Ferrule account. If it was you, choose a new password here (the link works once, for ${args.minutes} minutes):
${args.link}

If it was not you, ignore this message; your password stays as it is.
`;
  const html = layout(
    subject,
    [
      `Hello ${escapeHtml(args.name)},`,
      `Someone asked to reset the password of your Ferrule account. If it was you, choose a new password (the link works once, for ${args.minutes} minutes).`,
      'If it was not you, ignore this message; your password stays as it is.',
    ],
    args.link,
    'Choose a new password',
  );
  return { subject, text, html };
}
