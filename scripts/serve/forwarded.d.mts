// Types of forwarded.mjs (plain JavaScript, so scripts/serve.mjs runs on node without a build step).
export function trustedHops(value: string | undefined): number;
export function rewriteForwarded(
  headers: Record<string, string | string[] | undefined>,
  socketAddress: string | undefined,
  hops: number,
): void;
