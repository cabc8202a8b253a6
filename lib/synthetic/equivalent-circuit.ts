/**
 * The equivalent-circuit log generator: the circuit (circuit.ts) and its CSV writer (csv.ts), one
 * import for seeds, tests and the benchmark.
 */
export * from "./circuit";
export * from "./csv";
