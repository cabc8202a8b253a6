// The column picker's state and its translation to and from a ColumnMapping (pure; browser-safe): one role
// per column of the previewed log, the units, whether the log has a header row, and the discharge sign.
import {
  columnMappingSchema,
  parseMappingJson,
  type ColumnMapping,
  type ColumnRef,
  type LogTablePreview,
} from "@/lib/analysis";

export const COLUMN_ROLES = ["ignore", "time", "voltage", "current", "temperature", "cell"] as const;
export type ColumnRole = (typeof COLUMN_ROLES)[number];
export const COLUMN_ROLE_LABELS: Record<ColumnRole, string> = {
  ignore: "not used",
  time: "time",
  voltage: "pack voltage",
  current: "current",
  temperature: "pack temperature",
  cell: "a cell's voltage",
};
/** Roles only one column may have. */
const SINGLE: ColumnRole[] = ["time", "voltage", "current", "temperature"];

export type MappingForm = {
  roles: ColumnRole[];
  hasHeader: boolean;
  timeUnit: ColumnMapping["timeUnit"] | "";
  voltageUnit: ColumnMapping["voltageUnit"] | "";
  currentUnit: ColumnMapping["currentUnit"] | "";
  temperatureUnit: ColumnMapping["temperatureUnit"] | "";
  dischargeSign: ColumnMapping["dischargeSign"] | "";
};

/** The preview's header row (the fields of the line detection or the tester named), null without one. */
export function headerFields(preview: LogTablePreview, hasHeader: boolean): string[] | null {
  if (!hasHeader) return null;
  const line = preview.headerLine ?? preview.rows.find((r) => r.fields.some((f) => Number.isNaN(Number(f))))?.line;
  return preview.rows.find((r) => r.line === line)?.fields ?? null;
}

/** The data rows to show under the pickers: after the header row when there is one. */
export function dataRows(preview: LogTablePreview, hasHeader: boolean, max = 6): LogTablePreview["rows"] {
  const header = hasHeader ? (preview.headerLine ?? 0) : 0;
  return preview.rows.filter((r) => r.line > header).slice(0, max);
}

function indexOf(ref: ColumnRef | undefined, header: string[] | null): number | null {
  if (ref === undefined) return null;
  if (typeof ref === "number") return ref;
  const wanted = ref.trim().toLowerCase();
  const i =
    header?.findIndex(
      (h) =>
        h
          .replace(/^\uFEFF/, "")
          .trim()
          .toLowerCase() === wanted,
    ) ?? -1;
  return i >= 0 ? i : null;
}

/** The picker's state from a mapping (detected, a bench profile's, or the tester's last one). */
export function formFromMapping(
  mapping: ColumnMapping | null,
  preview: LogTablePreview,
  fallbackHasHeader = preview.headerLine !== null,
): MappingForm {
  const hasHeader = mapping?.hasHeader ?? fallbackHasHeader;
  const header = headerFields(preview, hasHeader);
  const roles: ColumnRole[] = Array.from({ length: preview.columnCount }, () => "ignore");
  const put = (ref: ColumnRef | undefined, role: ColumnRole) => {
    const i = indexOf(ref, header);
    if (i !== null && i < roles.length) roles[i] = role;
  };
  for (const ref of mapping?.cellVoltages ?? []) put(ref, "cell");
  put(mapping?.time, "time");
  put(mapping?.voltage, "voltage");
  put(mapping?.current, "current");
  put(mapping?.temperature, "temperature");
  return {
    roles,
    hasHeader,
    timeUnit: mapping?.timeUnit ?? "",
    voltageUnit: mapping?.voltageUnit ?? "",
    currentUnit: mapping?.currentUnit ?? "",
    temperatureUnit: mapping?.temperatureUnit ?? "",
    dischargeSign: mapping?.dischargeSign ?? "",
  };
}

/** Gives column `index` its role; a role only one column may have leaves the column that had it. */
export function setRole(roles: ColumnRole[], index: number, role: ColumnRole): ColumnRole[] {
  return roles.map((r, i) => (i === index ? role : SINGLE.includes(role) && r === role ? "ignore" : r));
}

/** The mapping the form describes, by column number (valid with or without a header row). */
export function mappingFromForm(form: MappingForm): ColumnMapping {
  const m: ColumnMapping = { hasHeader: form.hasHeader };
  const cells: number[] = [];
  form.roles.forEach((role, i) => {
    if (role === "cell") cells.push(i);
    else if (role !== "ignore") m[role] = i;
  });
  if (cells.length > 0) m.cellVoltages = cells;
  if (form.timeUnit) m.timeUnit = form.timeUnit;
  if (form.voltageUnit) m.voltageUnit = form.voltageUnit;
  if (form.currentUnit) m.currentUnit = form.currentUnit;
  if (form.temperatureUnit) m.temperatureUnit = form.temperatureUnit;
  if (form.dischargeSign) m.dischargeSign = form.dischargeSign;
  return m;
}

/** What is missing before the mapping can be used, in words (empty when it can). */
export function mappingProblems(form: MappingForm): string[] {
  const has = (r: ColumnRole) => form.roles.includes(r);
  const out: string[] = [];
  if (!has("time")) out.push("Choose the time column.");
  if (!has("current")) out.push("Choose the current column.");
  if (!has("voltage") && !has("cell")) out.push("Choose the pack voltage column (or the cells' voltage columns).");
  const parsed = columnMappingSchema.safeParse(mappingFromForm(form));
  if (out.length === 0 && !parsed.success) out.push(...parsed.error.issues.map((i) => i.message));
  return out;
}

/** A mapping as the JSON text the API's `mapping` parameter and the forms carry. */
export function mappingJson(mapping: ColumnMapping | null): string {
  return mapping ? JSON.stringify(mapping) : "";
}

/** A stored mapping's JSON read back leniently: null when empty or unusable (the caller re-detects). */
export function mappingFromJson(text: string | null | undefined): ColumnMapping | null {
  if (!text) return null;
  const r = parseMappingJson(text);
  return r.ok ? r.mapping : null;
}

const refWords = (ref: ColumnRef) => (typeof ref === "number" ? `column ${ref + 1}` : `“${ref}”`);

/** A mapping in words: "time column 1 (s), voltage column 2 (mV), current column 3; no header row". */
export function describeMapping(m: ColumnMapping): string {
  const parts: string[] = [];
  const unit = (u: string | undefined) => (u ? ` (${u})` : "");
  if (m.time !== undefined) parts.push(`time ${refWords(m.time)}${unit(m.timeUnit)}`);
  if (m.voltage !== undefined) parts.push(`voltage ${refWords(m.voltage)}${unit(m.voltageUnit)}`);
  if (m.current !== undefined) parts.push(`current ${refWords(m.current)}${unit(m.currentUnit)}`);
  if (m.temperature !== undefined)
    parts.push(`temperature ${refWords(m.temperature)}${m.temperatureUnit ? ` (°${m.temperatureUnit})` : ""}`);
  if (m.cellVoltages) parts.push(`cells ${m.cellVoltages.map(refWords).join(", ")}`);
  const extra: string[] = [];
  if (m.hasHeader === false) extra.push("no header row");
  if (m.hasHeader === true) extra.push("with a header row");
  if (m.dischargeSign) extra.push(`discharge current ${m.dischargeSign}`);
  return `${parts.join(", ")}${extra.length ? `; ${extra.join(", ")}` : ""}`;
}

/**
 * A log whose first rows are numbers (no header row): the columns can only be named by the tester, so a page
 * waits for the mapping before sending it. Any other failure of detection (odd header names, or not a log at
 * all) is sent as it is, and the server's message says what is wrong.
 */
export function waitsForMapping(preview: LogTablePreview): boolean {
  if (preview.detected !== null) return false;
  const first = preview.rows[0];
  if (!first) return false;
  const filled = first.fields.filter((f) => f.trim() !== "");
  const numeric = filled.filter((f) => Number.isFinite(Number(f.trim().replace(",", "."))));
  return filled.length > 0 && numeric.length * 2 >= filled.length;
}
