// HTML pieces for the messages: escaping and one plain layout. Pure.

/** Escapes text for an HTML element or a double-quoted attribute. */
export function escapeHtml(text: string): string {
  return text.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;").replace(/'/g, "&#39;");
}

/** A paragraph per entry; each entry is already-escaped HTML. */
export const paragraphs = (parts: string[]) => parts.map((p) => `<p style="margin:0 0 14px">${p}</p>`).join("\n");

/** A button-like link (the plain-text part carries the same address on its own line). */
export const linkButton = (href: string, label: string) =>
  `<p style="margin:20px 0"><a href="${escapeHtml(href)}" style="background:#1d4ed8;color:#ffffff;padding:10px 18px;border-radius:6px;text-decoration:none;font-weight:600">${escapeHtml(label)}</a></p>`;

/** The whole document: a narrow column, system fonts, a quiet footer. */
export function layout(title: string, bodyHtml: string): string {
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><title>${escapeHtml(title)}</title></head>
<body style="margin:0;padding:24px;background:#f4f5f7;font-family:-apple-system,Segoe UI,Helvetica,Arial,sans-serif;color:#1f2933;font-size:15px;line-height:1.5">
<div style="max-width:560px;margin:0 auto;background:#ffffff;border-radius:8px;padding:24px 28px">
<p style="margin:0 0 18px;font-weight:700;color:#1d4ed8;letter-spacing:.02em">Farfield</p>
${bodyHtml}
<p style="margin:24px 0 0;color:#6b7280;font-size:13px">Sent by Farfield for your band program. If you did not expect this message you can ignore it.</p>
</div></body></html>`;
}
