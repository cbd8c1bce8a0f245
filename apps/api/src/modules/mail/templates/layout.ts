export interface MailContent {
  subject: string;
  text: string;
  html: string;
}

export function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (char) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[char]!);
}

/** Plain paragraphs and one call-to-action link, in both text and HTML form. */
export function composeMail(input: { subject: string; greeting: string; paragraphs: string[]; action: { label: string; url: string }; footer: string }): MailContent {
  const text = [input.greeting, '', ...input.paragraphs.flatMap((p) => [p, '']), `${input.action.label}: ${input.action.url}`, '', input.footer, '', '— Limitbook'].join('\n');
  const html = `<!doctype html>
<html><body style="font-family: Georgia, serif; color: #1d2a33; max-width: 560px; margin: 0 auto; padding: 24px;">
<p style="font-size: 18px; font-weight: bold; color: #1f5c4a;">Limitbook</p>
<p>${escapeHtml(input.greeting)}</p>
${input.paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`).join('\n')}
<p><a href="${escapeHtml(input.action.url)}" style="display: inline-block; padding: 10px 18px; background: #1f5c4a; color: #ffffff; text-decoration: none; border-radius: 4px;">${escapeHtml(input.action.label)}</a></p>
<p style="font-size: 13px; color: #5b6770;">If the button does not work, paste this address into your browser:<br>${escapeHtml(input.action.url)}</p>
<p style="font-size: 13px; color: #5b6770;">${escapeHtml(input.footer)}</p>
</body></html>`;
  return { subject: input.subject, text, html };
}
