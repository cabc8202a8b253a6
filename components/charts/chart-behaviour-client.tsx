"use client";
// The only script charts need, mounted once per page: the table toggle, tooltips on points (focus or
// pointer) and the keyboard reading of line charts (← → Home End, Esc). Everything it shows is read from the
// chart's own table rows in the page, so the drawings and their numbers stay server-rendered and are sent once.
// Listeners sit on the document, so charts that arrive later (the home page's group switcher) work too.
import { useEffect } from "react";

const figureOf = (el: Element) => el.closest<HTMLElement>("[data-chart]");
/** A chart's point: a link in its drawing, described by its table row. */
const POINT = ".chart-svg a[aria-describedby]";

function rowText(row: Element | null): string[] {
  if (!row) return [];
  const table = row.closest("table");
  const heads = [...(table?.querySelectorAll("thead th") ?? [])].map((th) => th.textContent ?? "");
  return [...row.children].map((cell, i) => (i === 0 ? (cell.textContent ?? "") : `${heads[i]}: ${cell.textContent}`));
}

function showTip(fig: HTMLElement, lines: string[], anchor: DOMRect) {
  const tip = fig.querySelector<HTMLElement>("[data-chart-tip]");
  const plot = fig.querySelector<HTMLElement>("[data-chart-plot]");
  if (!tip || !plot || lines.length === 0) return;
  tip.replaceChildren(
    ...lines.map((l, i) => {
      const p = document.createElement("p");
      p.textContent = l;
      if (i === 0) p.className = "font-medium";
      return p;
    }),
  );
  const box = plot.getBoundingClientRect();
  const left = anchor.left - box.left + anchor.width / 2;
  const flip = left > box.width - 230;
  tip.style.left = flip ? "" : `${left + 12}px`;
  tip.style.right = flip ? `${box.width - left + 12}px` : "";
  tip.style.top = `${Math.max(0, anchor.top - box.top - 20)}px`;
  tip.hidden = false;
}

function hideTips(scope: ParentNode = document) {
  scope.querySelectorAll<HTMLElement>("[data-chart-tip]").forEach((t) => (t.hidden = true));
  scope
    .querySelectorAll("[data-chart-cursor], [data-chart-ring]")
    .forEach((c) => c.setAttribute("visibility", "hidden"));
}

function showPoint(point: Element, focused: boolean) {
  const fig = figureOf(point);
  const id = point.getAttribute("aria-describedby");
  if (!fig || !id) return;
  showTip(fig, rowText(document.getElementById(id)), point.getBoundingClientRect());
  // The chart's one focus ring goes round the focused point's marker.
  const mark = point.querySelector("use");
  const ring = point.closest("svg")?.querySelector("[data-chart-ring]");
  if (focused && mark && ring) {
    ring.setAttribute("cx", mark.getAttribute("x") ?? "0");
    ring.setAttribute("cy", mark.getAttribute("y") ?? "0");
    ring.setAttribute("visibility", "visible");
  }
}

/** Readings of a line chart: its table rows, each with the x (percent of the plot) it reads at. */
function readings(fig: HTMLElement) {
  return [...fig.querySelectorAll<HTMLElement>("[data-chart-table] tbody tr[data-x]")];
}

function showReading(svg: SVGSVGElement, index: number) {
  const fig = figureOf(svg);
  if (!fig) return;
  const rows = readings(fig);
  const row = rows[Math.max(0, Math.min(rows.length - 1, index))];
  if (!row) return;
  svg.dataset.at = String(rows.indexOf(row));
  const x = `${row.dataset.x}%`;
  const cursor = svg.querySelector("[data-chart-cursor]");
  cursor?.setAttribute("x1", x);
  cursor?.setAttribute("x2", x);
  cursor?.setAttribute("visibility", "visible");
  const box = svg.getBoundingClientRect();
  const at = box.left + (Number(row.dataset.x) / 100) * box.width;
  showTip(fig, rowText(row), new DOMRect(at, box.top + 30, 0, 0));
}

function toggle(button: HTMLElement) {
  const fig = figureOf(button);
  if (!fig) return;
  const toTable = button.getAttribute("aria-pressed") !== "true";
  button.setAttribute("aria-pressed", String(toTable));
  button.textContent = toTable ? "Show as chart" : "Show as table";
  fig.querySelectorAll<HTMLElement>("[data-chart-plot], .chart-legend").forEach((el) => (el.hidden = toTable));
  const table = fig.querySelector<HTMLElement>("[data-chart-table]");
  if (table) table.hidden = !toTable;
  hideTips(fig);
}

function install(): () => void {
  const onClick = (e: MouseEvent) => {
    const b = (e.target as Element | null)?.closest?.<HTMLElement>("[data-chart-toggle]");
    if (b) toggle(b);
  };
  const onFocusIn = (e: FocusEvent) => {
    const point = (e.target as Element | null)?.closest?.(POINT);
    if (point) showPoint(point, true);
  };
  const onOver = (e: MouseEvent) => {
    const point = (e.target as Element | null)?.closest?.(POINT);
    if (point) showPoint(point, false);
  };
  const onOut = (e: Event) => {
    const t = e.target as Element | null;
    if (t?.closest?.(POINT) || (e.type === "focusout" && t?.closest?.("[data-readings]"))) {
      const fig = figureOf(t);
      if (fig) hideTips(fig);
    }
  };
  const onKey = (e: KeyboardEvent) => {
    if (e.key === "Escape") return hideTips();
    const svg = (e.target as Element | null)?.closest?.<SVGSVGElement>("svg[data-readings]");
    if (!svg || !["ArrowLeft", "ArrowRight", "Home", "End"].includes(e.key)) return;
    e.preventDefault();
    const fig = figureOf(svg);
    const last = fig ? readings(fig).length - 1 : 0;
    const now = svg.dataset.at === undefined ? -1 : Number(svg.dataset.at);
    const next = e.key === "Home" ? 0 : e.key === "End" ? last : now + (e.key === "ArrowRight" ? 1 : -1);
    showReading(svg, Math.max(0, Math.min(last, next)));
  };
  const onMove = (e: MouseEvent) => {
    const svg = (e.target as Element | null)?.closest?.<SVGSVGElement>("svg[data-readings]");
    const fig = svg && figureOf(svg);
    if (!svg || !fig) return;
    const box = svg.getBoundingClientRect();
    const xPct = ((e.clientX - box.left) / box.width) * 100;
    const rows = readings(fig);
    let best = 0;
    rows.forEach((r, i) => {
      if (Math.abs(Number(r.dataset.x) - xPct) < Math.abs(Number(rows[best]?.dataset.x) - xPct)) best = i;
    });
    showReading(svg, best);
  };
  const onLeave = (e: MouseEvent) => {
    const svg = (e.target as Element | null)?.closest?.("svg[data-readings]");
    const fig = svg && figureOf(svg);
    if (fig && !svg.contains(e.relatedTarget as Node | null)) hideTips(fig);
  };
  const pairs: [string, EventListener][] = [
    ["click", onClick as EventListener],
    ["focusin", onFocusIn as EventListener],
    ["focusout", onOut],
    ["mouseover", onOver as EventListener],
    ["mouseout", onOut],
    ["keydown", onKey as EventListener],
    ["mousemove", onMove as EventListener],
    ["mouseout", onLeave as EventListener],
  ];
  for (const [type, fn] of pairs) document.addEventListener(type, fn);
  return () => {
    for (const [type, fn] of pairs) document.removeEventListener(type, fn);
  };
}

export function ChartBehaviour() {
  useEffect(install, []);
  return null;
}
