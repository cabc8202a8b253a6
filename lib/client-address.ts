// Reading a client's address for per-address limits, pure (the server and proxy.ts both use it; see
// server/client-address.ts for where the header comes from and why only trusted hops count).

/** The address N trusted hops from the right of an X-Forwarded-For value (the leftmost if it is shorter). */
export function pickForwardedAddress(forwardedFor: string | null, trustedHops: number): string | null {
  const entries = (forwardedFor ?? "")
    .split(",")
    .map((s) => s.trim())
    .filter(Boolean);
  if (entries.length === 0) return null;
  return entries[Math.max(0, entries.length - 1 - trustedHops)] ?? null;
}

const IPV4 = /^(25[0-5]|2[0-4]\d|1\d\d|[1-9]?\d)(\.(25[0-5]|2[0-4]\d|1\d\d|[1-9]?\d)){3}$/;
const HEXTET = /^[0-9a-f]{1,4}$/;

/** The eight groups of an IPv6 address written with or without "::"; null when it is not one. */
function ipv6Groups(address: string): string[] | null {
  const halves = address.split("::");
  if (halves.length > 2) return null;
  const left = halves[0] ? halves[0].split(":") : [];
  const right = halves.length === 2 && halves[1] ? halves[1].split(":") : [];
  const groups =
    halves.length === 2
      ? left.length + right.length < 8
        ? [...left, ...Array<string>(8 - left.length - right.length).fill("0"), ...right]
        : null
      : left;
  if (!groups || groups.length !== 8 || !groups.every((g) => HEXTET.test(g))) return null;
  return groups;
}

/**
 * One bucket name per client: an IPv4 address as is (IPv4-mapped IPv6 unwrapped), an IPv6 address by its
 * /64 network (one subscriber usually holds a whole /64, so single addresses would be free new buckets),
 * and anything unreadable as "unknown" (one shared bucket, never a new one per value).
 */
export function addressBucket(raw: string | null): string {
  if (!raw) return "unknown";
  let a = raw.trim().toLowerCase();
  const bracketed = /^\[([^\]]+)\](?::\d+)?$/.exec(a);
  if (bracketed?.[1]) a = bracketed[1];
  else if (/^[\d.]+:\d+$/.test(a)) a = a.slice(0, a.lastIndexOf(":"));
  a = a.replace(/%.*$/, ""); // an IPv6 zone index
  const mapped = /^::ffff:([\d.]+)$/.exec(a);
  if (mapped?.[1]) a = mapped[1];
  if (IPV4.test(a)) return a;
  const groups = ipv6Groups(a);
  if (groups)
    return `${groups
      .slice(0, 4)
      .map((g) => g.replace(/^0+(?=.)/, ""))
      .join(":")}::/64`;
  return "unknown";
}
