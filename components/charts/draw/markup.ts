// Static markup of the chart drawings, for the places React DOM's own renderer cannot reach: the PNG/SVG
// images, the embed and the home page's group fragments are route handlers, which Next.js bundles for React
// Server Components, where `react-dom/server` is refused (React's react-server build throws, Next aliases it to
// an error). The drawings under components/charts/draw/ are plain function components without hooks, so a
// small walk of their element tree gives exactly what React DOM's renderToStaticMarkup gives (a unit test
// holds the two equal on every drawing). Kept deliberately narrow: host elements, function components,
// fragments, text; no hooks, no context, no style objects.
import { Fragment, isValidElement, type ReactNode } from "react";

// Attribute names React writes as they are (everything else camelCase is written kebab-case, as React DOM does
// for SVG presentation attributes).
const KEEP = new Set(["viewBox", "preserveAspectRatio", "gradientUnits", "patternUnits", "textLength"]);
const RENAME: Record<string, string> = {
  className: "class",
  htmlFor: "for",
  tabIndex: "tabindex",
  xlinkHref: "xlink:href",
  charSet: "charset",
};
const VOID = new Set(["area", "base", "br", "col", "embed", "hr", "img", "input", "link", "meta", "source", "wbr"]);
const SKIP = new Set(["children", "key", "ref", "dangerouslySetInnerHTML", "suppressHydrationWarning"]);

/** React DOM's escaping of text and attribute values. */
function escapeMarkup(text: string): string {
  return text
    .replace(/&/g, "&amp;")
    .replace(/</g, "&lt;")
    .replace(/>/g, "&gt;")
    .replace(/"/g, "&quot;")
    .replace(/'/g, "&#x27;");
}

function attrName(name: string): string {
  if (RENAME[name]) return RENAME[name];
  if (KEEP.has(name) || name.startsWith("aria-") || name.startsWith("data-")) return name;
  return name.replace(/[A-Z]/g, (c) => `-${c.toLowerCase()}`);
}

function attributes(props: Record<string, unknown>): string {
  let out = "";
  for (const [name, value] of Object.entries(props)) {
    if (SKIP.has(name) || value === null || value === undefined) continue;
    if (typeof value === "function" || /^on[A-Z]/.test(name)) continue;
    if (name === "style") throw new Error("chart drawings use attributes, not style objects");
    // aria-* and data-* spell booleans out; other attributes are present ("") or absent.
    const spelled = name.startsWith("aria-") || name.startsWith("data-");
    if (typeof value === "boolean" && !spelled) {
      if (value) out += ` ${attrName(name)}=""`;
      continue;
    }
    out += ` ${attrName(name)}="${escapeMarkup(String(value))}"`;
  }
  return out;
}

type Props = Record<string, unknown> & { children?: ReactNode; dangerouslySetInnerHTML?: { __html: string } };

/** The markup of an element tree of host elements and hook-free function components. */
export function toMarkup(node: ReactNode): string {
  if (node === null || node === undefined || typeof node === "boolean") return "";
  if (typeof node === "string") return escapeMarkup(node);
  if (typeof node === "number" || typeof node === "bigint") return String(node);
  if (Array.isArray(node)) return node.map(toMarkup).join("");
  if (!isValidElement(node)) throw new Error("chart drawings render elements, text and arrays only");
  const props = node.props as Props;
  if (node.type === Fragment) return toMarkup(props.children);
  if (typeof node.type === "function") return toMarkup((node.type as (p: Props) => ReactNode)(props));
  if (typeof node.type !== "string") throw new Error("chart drawings use host elements and plain function components");
  const tag = node.type;
  const open = `<${tag}${attributes(props)}>`;
  if (VOID.has(tag)) return open;
  const inner = props.dangerouslySetInnerHTML ? props.dangerouslySetInnerHTML.__html : toMarkup(props.children);
  return `${open}${inner}</${tag}>`;
}
