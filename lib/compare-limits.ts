// How many packs /compare takes. Its own module, with no imports, so the compare picker (a client component) can
// read the limit without pulling the comparison code (and zod, through it) into the browser's JavaScript.
export const MIN_COMPARE = 2;
export const MAX_COMPARE = 6;
