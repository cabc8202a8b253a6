// A deliberately plain HTML wrapper for our e-mails: one column, system fonts, inline styles only, and
// every interpolated value escaped. The text part is always complete on its own.
export function escapeHtml(s: string): string {
  return s.replace(
    /[&<>"']/g,
    (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c] ?? c,
  );
}

export type HtmlBlock =
  | { kind: "p"; text: string }
  | { kind: "button"; href: string; label: string }
  | { kind: "small"; text: string }
  | { kind: "link"; href: string };

function block(b: HtmlBlock): string {
  switch (b.kind) {
    case "p":
      return `<p style="margin:0 0 14px;line-height:1.5">${escapeHtml(b.text)}</p>`;
    case "small":
      return `<p style="margin:0 0 10px;line-height:1.5;font-size:13px;color:#4a5160">${escapeHtml(b.text)}</p>`;
    case "button":
      return `<p style="margin:20px 0"><a href="${escapeHtml(b.href)}" style="display:inline-block;background:#e08a12;color:#12151b;text-decoration:none;font-weight:600;padding:10px 18px;border-radius:6px">${escapeHtml(b.label)}</a></p>`;
    case "link":
      return `<p style="margin:0 0 14px;font-size:13px;word-break:break-all"><a href="${escapeHtml(b.href)}" style="color:#146d63">${escapeHtml(b.href)}</a></p>`;
  }
}

export function htmlMail(heading: string, blocks: HtmlBlock[]): string {
  return [
    `<!doctype html><html lang="en-GB"><body style="margin:0;background:#f6f4ee;color:#1b1f27;font-family:system-ui,-apple-system,'Segoe UI',sans-serif;font-size:15px">`,
    `<div style="max-width:560px;margin:0 auto;padding:24px">`,
    `<p style="margin:0 0 18px;font-weight:700;font-size:18px">Sagline</p>`,
    `<div style="background:#ffffff;border:1px solid #e3dfd4;border-radius:8px;padding:20px">`,
    `<h1 style="margin:0 0 14px;font-size:19px">${escapeHtml(heading)}</h1>`,
    ...blocks.map(block),
    `</div>`,
    `<p style="margin:16px 0 0;font-size:12px;color:#7b8291">Sagline — measured LiPo packs, method attached. Open data under CC BY 4.0.</p>`,
    `</div></body></html>`,
  ].join("");
}
