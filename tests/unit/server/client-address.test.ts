// Client addresses from trusted hops only: the header rewrite scripts/serve.mjs applies before Next.js, and
// how the app reads the result (lib/client-address.ts). The rule — count proxies from the right, trust only
// as many as configured — is the usual one for X-Forwarded-For (MDN, "X-Forwarded-For: Security and privacy
// concerns"; common practice), IPv6 buckets by /64 (RFC 6177 recommends a /48–/64 per subscriber site).
import { describe, expect, it } from "vitest";
import { addressBucket, pickForwardedAddress } from "@/lib/client-address";
import { rewriteForwarded, trustedHops } from "@/scripts/serve/forwarded.mjs";

function through(sent: Record<string, string>, socket: string, hops: number) {
  const headers: Record<string, string | string[] | undefined> = { ...sent };
  rewriteForwarded(headers, socket, hops);
  return headers;
}

describe("scripts/serve.mjs's rewrite", () => {
  it("no trusted proxy: X-Forwarded-For becomes the socket address; a client's forwarding headers are dropped", () => {
    const h = through(
      {
        "x-forwarded-for": "1.2.3.4",
        "x-forwarded-host": "evil.example",
        "x-forwarded-proto": "https",
        "x-real-ip": "5.6.7.8",
      },
      "198.51.100.9",
      0,
    );
    expect(h).toEqual({ "x-forwarded-for": "198.51.100.9" });
  });

  it("one trusted proxy: its header stays and the socket (the proxy) is appended", () => {
    expect(through({ "x-forwarded-for": "6.6.6.6, 203.0.113.7" }, "10.0.0.2", 1)["x-forwarded-for"]).toBe(
      "6.6.6.6, 203.0.113.7, 10.0.0.2",
    );
    expect(through({}, "10.0.0.2", 1)["x-forwarded-for"]).toBe("10.0.0.2");
  });

  it("reads TRUSTED_PROXY_HOPS as a whole number 0–10", () => {
    expect(trustedHops(undefined)).toBe(0);
    expect(trustedHops("2")).toBe(2);
    for (const bad of ["-1", "11", "1.5", "two"]) expect(() => trustedHops(bad), bad).toThrow(/TRUSTED_PROXY_HOPS/);
  });
});

describe("the app's reading", () => {
  it("takes the entry N trusted hops from the right, so forged entries on the left never count", () => {
    // no proxy: serve.mjs left only the socket
    expect(pickForwardedAddress("198.51.100.9", 0)).toBe("198.51.100.9");
    // one proxy: client-written junk, the address the proxy saw, the proxy itself
    for (const junk of ["6.6.6.6", "1.1.1.1, 2.2.2.2", "not an address"])
      expect(pickForwardedAddress(`${junk}, 203.0.113.7, 10.0.0.2`, 1)).toBe("203.0.113.7");
    // fewer entries than hops: the leftmost (the request bypassed the proxies)
    expect(pickForwardedAddress("10.0.0.2", 2)).toBe("10.0.0.2");
    expect(pickForwardedAddress(null, 0)).toBeNull();
  });

  it("buckets: IPv4 as is (ports and IPv4-mapped IPv6 unwrapped), IPv6 by /64, junk in one shared bucket", () => {
    expect(addressBucket("203.0.113.7")).toBe("203.0.113.7");
    expect(addressBucket("203.0.113.7:51234")).toBe("203.0.113.7");
    expect(addressBucket("::ffff:203.0.113.7")).toBe("203.0.113.7");
    expect(addressBucket("2001:db8:1:2:aaaa::1")).toBe("2001:db8:1:2::/64");
    expect(addressBucket("[2001:db8:1:2:bbbb::9]:443")).toBe("2001:db8:1:2::/64");
    expect(addressBucket("2001:0db8:0001:0002:0000:0000:0000:0001")).toBe("2001:db8:1:2::/64");
    expect(addressBucket("fe80::1%eth0")).toBe("fe80:0:0:0::/64");
    for (const junk of ["", "evil", "999.1.1.1", "1.2.3", "01.2.3.4", "::gg", "1:2:3:4:5:6:7:8:9"])
      expect(addressBucket(junk), junk).toBe("unknown");
    expect(addressBucket(null)).toBe("unknown");
  });
});
