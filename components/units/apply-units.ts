// Converts what a server-rendered page marked up into the reader's units: an element with data-u (the quantity,
// lib/units.ts), data-v (its value as rendered) and, for per-cell figures, data-s (cells in series) gets its
// number rewritten — with the unit symbol when it carries data-sym — and an element with data-usym gets the
// symbol. The text as rendered is kept (data-t0), so going back to the defaults restores it exactly.
import { convert, digitsFor, isQuantity, isDefaultUnits, symbol, type UnitPrefs } from "@/lib/units";

const decimals = (text: string) => /\.(\d+)/.exec(text)?.[1]?.length ?? 0;
const num = (v: number, digits: number) =>
  v.toLocaleString("en-GB", { minimumFractionDigits: digits, maximumFractionDigits: digits });

function rewrite(el: HTMLElement | SVGElement, prefs: UnitPrefs, column?: { q: string; s?: string }) {
  const d = el.dataset;
  const q = column?.q ?? d.u;
  if (!isQuantity(q)) return;
  // The text as rendered, taken again when a client render has changed the value since.
  if (d.t0 === undefined || d.tv !== d.v) {
    d.t0 = el.textContent ?? "";
    d.tv = d.v;
  }
  // A table column's cells carry only their text: the number is read from it.
  const raw = column ? d.t0.replace(/,/g, "").trim() : (d.v ?? "");
  const value = raw === "" ? Number.NaN : Number(raw);
  const s = column ? column.s : d.s;
  const cells = s ? Number(s) : undefined;
  let text = d.t0;
  if (!isDefaultUnits(prefs) && Number.isFinite(value)) {
    const digits = digitsFor(q, decimals(d.t0), prefs, cells);
    const n = num(convert(q, value, prefs, cells), digits);
    text = d.sym !== undefined ? `${n} ${symbol(q, prefs, cells)}` : n;
  }
  if (el.textContent !== text) el.textContent = text;
}

function resymbol(el: HTMLElement | SVGElement, prefs: UnitPrefs) {
  const q = el.dataset.usym;
  if (!isQuantity(q)) return;
  const cells = el.dataset.s ? Number(el.dataset.s) : undefined;
  el.dataset.t0 ??= el.textContent ?? "";
  const text = isDefaultUnits(prefs) ? el.dataset.t0 : symbol(q, prefs, cells);
  if (el.textContent !== text) el.textContent = text;
}

/** Every cell of a column whose header carries data-cu (its quantity) and data-s (cells in series). */
function rewriteColumns(root: ParentNode, prefs: UnitPrefs) {
  root.querySelectorAll<HTMLTableCellElement>("thead th[data-cu]").forEach((th) => {
    const table = th.closest("table");
    const q = th.dataset.cu ?? "";
    const index = th.cellIndex;
    table?.querySelectorAll("tbody tr").forEach((tr) => {
      const cell = tr.children[index];
      if (cell instanceof HTMLElement) rewrite(cell, prefs, { q, s: th.dataset.s });
    });
  });
}

export function applyUnits(root: ParentNode, prefs: UnitPrefs): void {
  root.querySelectorAll<HTMLElement | SVGElement>("[data-u]").forEach((el) => rewrite(el, prefs));
  rewriteColumns(root, prefs);
  root.querySelectorAll<HTMLElement | SVGElement>("[data-usym]").forEach((el) => resymbol(el, prefs));
}
