// Invented logs for tests: the equivalent-circuit generator in the dialects testers' loggers write.
import { generateLog, toCsv, type CsvDialect, type EcmOptions, type EcmRow } from "@/lib/synthetic/equivalent-circuit";

export const SEMICOLON_DIALECT: CsvDialect = {
  delimiter: ";",
  decimalComma: true,
  voltageUnit: "mV",
  currentUnit: "mA",
  timeUnit: "ms",
};

/** The equivalent-circuit settings of the tests' usual pack: a 4S 1300 mAh pack discharged at 10C to 3.3 V per
 * cell, sampled at 1 Hz, with a logger's small noise. Tests spread it and change what they study. */
export const SAMPLE_PACK: EcmOptions = {
  seed: 42,
  cells: 4,
  capacityMah: 1300,
  r0PerCellMohm: 3,
  r1PerCellMohm: 1,
  loadCurrentA: 13,
  cutoffVPerCell: 3.3,
  ambientC: 22,
  sampleIntervalS: 1,
  initialRestS: 5,
  finalRestS: 5,
  noise: { voltageV: 0.004, currentA: 0.004, temperatureC: 0.05 },
};

/** SAMPLE_PACK's log as CSV (about 100 kB) and its truth. */
export function sampleLog(
  options: EcmOptions = {},
  dialect: CsvDialect = {},
): { csv: string; truth: ReturnType<typeof generateLog>["truth"] } {
  const { rows, truth } = generateLog({ ...SAMPLE_PACK, ...options });
  return { csv: toCsv(rows, dialect), truth };
}

/**
 * A slower logger beside a faster tester: keeps one row in `every`, starting at row `offset`. The
 * tester stops the load by its own fast meter, so the kept log usually ends its discharge a little
 * above the cut-off, as real logs do.
 */
export function decimate(rows: EcmRow[], every: number, offset = 0): EcmRow[] {
  return rows.filter((_, k) => k % every === offset % every);
}

/** hh:mm:ss for a time of day in seconds (wraps at 24 h, as a logger's clock does). */
export function clock(seconds: number): string {
  const s = Math.round(seconds) % 86400;
  const pad = (n: number) => String(n).padStart(2, "0");
  return `${pad(Math.floor(s / 3600))}:${pad(Math.floor(s / 60) % 60)}:${pad(s % 60)}`;
}

/** A request as the browser or curl would send it. */
export function postRequest(url: string, body: BodyInit | null, headers: Record<string, string> = {}): Request {
  return new Request(new URL(url, "http://localhost:3013"), {
    method: "POST",
    body,
    headers,
    duplex: "half",
  } as RequestInit);
}

export function multipart(
  field: string,
  filename: string,
  content: string | Uint8Array<ArrayBuffer>,
  type = "text/csv",
): FormData {
  const fd = new FormData();
  fd.append(field, new Blob([content], { type }), filename);
  return fd;
}
