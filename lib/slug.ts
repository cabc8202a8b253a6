// URL slugs: catalogue entries (makers, packs — the seed and the proposal mutation) and heading anchors of
// the Markdown pages (server/markdown.ts).
export function slugify(text: string): string {
  const slug = text
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "")
    .slice(0, 80);
  return slug || "unnamed";
}
