/**
 * "19.3 ± 0.6 mΩ": a figure with its expanded uncertainty, rounded the way the GUM asks (7.2.6: U with at most
 * two significant digits, the value to the same decimal place). Which of one or two digits: the Particle Data
 * Group's rule (Review of Particle Physics, Introduction, "rounding"; from memory): the three leading digits of U
 * 100–354 → two significant digits, 355–949 → one, 950–999 → round up to 1000 and keep two.
 */

export type PlusMinus = { value: string; U: string; decimals: number; text: string };

/** Decimal places to show for an uncertainty U > 0 (negative means rounding to tens, hundreds…). */
export function uncertaintyDecimals(U: number): number {
  let exponent = Math.floor(Math.log10(U));
  // log10 can land a hair either side of an integer: settle the exponent so 100 ≤ leading three digits < 1000.
  while (U / 10 ** (exponent - 2) < 99.5) exponent--;
  while (U / 10 ** (exponent - 2) >= 999.5) exponent++;
  const lead3 = Math.round(U / 10 ** (exponent - 2));
  if (lead3 <= 354) return 1 - exponent;
  if (lead3 <= 949) return -exponent;
  return -exponent; // 950–999: rounds up to 1000 of the next decade, shown with two digits
}

function toFixedSigned(x: number, decimals: number): string {
  if (decimals >= 0) return x.toFixed(Math.min(decimals, 100));
  const step = 10 ** -decimals;
  return String(Math.round(x / step) * step);
}

/** Null when the value or U is not finite or U ≤ 0. */
export function formatPlusMinus(value: number, U95: number, unit = ""): PlusMinus | null {
  if (!Number.isFinite(value) || !Number.isFinite(U95) || !(U95 > 0)) return null;
  const decimals = uncertaintyDecimals(U95);
  const shownU = decimals >= 0 ? Math.round(U95 * 10 ** decimals) / 10 ** decimals : U95;
  const v = toFixedSigned(value, decimals);
  const u = toFixedSigned(shownU, decimals);
  return { value: v, U: u, decimals, text: `${v} ± ${u}${unit ? ` ${unit}` : ""}` };
}
