/**
 * How sure each number is: instrument accuracy (stated or assumed), the GUM propagation to every figure
 * (k = 2), a Monte Carlo check, median intervals from order statistics and the "distinguishable" rule.
 * Pure TypeScript, no I/O, no framework: safe in the browser. Method: content/methods/uncertainty.md.
 */
export * from "./accuracy";
export * from "./accuracy-classes";
export * from "./gum";
export * from "./discharge-figures";
export * from "./resistance-figures";
export * from "./monte-carlo";
export * from "./median-interval";
export * from "./compare";
export * from "./plus-minus";
