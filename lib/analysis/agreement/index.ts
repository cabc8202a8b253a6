/**
 * How well benches agree: ISO 13528:2015 Algorithm A consensus, z and Eₙ scores, the |z| > 3 plausibility flag
 * and a per-bench summary with suggestions. Pure TypeScript, no I/O: safe in the browser.
 */
export * from "./algorithm-a";
export * from "./scores";
export * from "./bench-summary";
