// Which address a rate limit counts: the socket address unless TRUST_PROXY_HOPS says how many
// proxies of ours append to X-Forwarded-For. The header format (comma-separated, each proxy appends
// the address it received the request from) is RFC 7239 §7.4 / the de-facto X-Forwarded-For
// convention; the "Nth from the right" rule is how a fixed number of trusted hops is read.
import { describe, expect, it } from "vitest";
import { POST as submit } from "@/app/api/requests/route";
import { POST as authPost } from "@/app/api/auth/[...all]/route";
import {
  CLIENT_HEADER,
  PEER_HEADER,
  clientAddress,
  normaliseAddress,
  trustPeerHeader,
  withClientHeader,
} from "@/lib/api/client-address";
import { resetEnvForTests } from "@/lib/env";
import { setupTestApp } from "../helpers/app";
import { ORIGIN } from "../helpers/auth";
import { fromClient } from "../helpers/client";

setupTestApp({ seed: true });

const headers = (entries: Record<string, string>) => new Headers(entries);

describe("clientAddress", () => {
  it("hops = 0: the socket address, whatever X-Forwarded-For claims", () => {
    const h = headers({ [PEER_HEADER]: "203.0.113.7", "x-forwarded-for": "198.51.100.1, 198.51.100.2" });
    expect(clientAddress(h, 0)).toBe("203.0.113.7");
  });

  it("hops = N: the Nth entry from the right, the one our outermost proxy wrote", () => {
    // Client forged "1.1.1.1"; proxy A appended the client's real address, proxy B appended A's.
    const h = headers({ [PEER_HEADER]: "192.0.2.10", "x-forwarded-for": "198.51.100.99, 203.0.113.5, 192.0.2.20" });
    expect(clientAddress(h, 1)).toBe("192.0.2.20");
    expect(clientAddress(h, 2)).toBe("203.0.113.5");
  });

  it("fewer entries than trusted hops: only the socket address is believed", () => {
    const h = headers({ [PEER_HEADER]: "192.0.2.10", "x-forwarded-for": "198.51.100.99" });
    expect(clientAddress(h, 2)).toBe("192.0.2.10");
  });

  it("a garbage or missing address is unknown, never the raw header text", () => {
    expect(clientAddress(headers({ [PEER_HEADER]: "not-an-ip" }), 0)).toBeNull();
    expect(clientAddress(headers({ "x-forwarded-for": "198.51.100.1" }), 0)).toBeNull();
    expect(clientAddress(headers({ [PEER_HEADER]: "192.0.2.1", "x-forwarded-for": "<script>" }), 1)).toBe("192.0.2.1");
  });

  it("one spelling per address: IPv4-mapped IPv6 and ports are folded (RFC 4291 §2.5.5.2)", () => {
    expect(normaliseAddress("::ffff:192.0.2.1")).toBe("192.0.2.1");
    expect(normaliseAddress("192.0.2.1:5000")).toBe("192.0.2.1");
    expect(normaliseAddress("[2001:DB8::1]:443")).toBe("2001:db8::1");
    expect(normaliseAddress("2001:db8::1\u0000")).toBeNull();
  });

  it("without the server wrapper the peer header is not believed (a client could send it)", () => {
    trustPeerHeader(false);
    try {
      expect(clientAddress(headers({ [PEER_HEADER]: "192.0.2.1" }), 0)).toBeNull();
    } finally {
      trustPeerHeader(true);
    }
  });

  it("better-auth gets our decision in its header, never a client's copy", () => {
    const request = new Request(`${ORIGIN()}/api/auth/sign-in/email`, {
      method: "POST",
      headers: { [PEER_HEADER]: "192.0.2.44", [CLIENT_HEADER]: "198.51.100.1", "x-forwarded-for": "198.51.100.2" },
      body: "{}",
    });
    expect(withClientHeader(request).headers.get(CLIENT_HEADER)).toBe("192.0.2.44");
  });
});

// The submit limit is 8 per 15 minutes per client (app/api/requests/route.ts). An empty JSON body
// is refused with 400 after the limiter has counted it, so no request is stored by these checks.
async function tenSubmits(client: string, forged: (i: number) => string | undefined) {
  const statuses: number[] = [];
  for (let i = 0; i < 10; i++) {
    const xff = forged(i);
    const response = await submit(
      new Request(`${ORIGIN()}/api/requests`, {
        method: "POST",
        headers: {
          "content-type": "application/json",
          ...fromClient(client),
          ...(xff ? { "x-forwarded-for": xff } : {}),
        },
        body: "{}",
      }),
      undefined as never,
    );
    statuses.push(response.status);
  }
  return statuses;
}

describe("forged X-Forwarded-For does not buy more submits", () => {
  const limitedLikePlain = [400, 400, 400, 400, 400, 400, 400, 400, 429, 429];

  it("hops = 0: ten forged headers from one socket are limited like ten plain submits", async () => {
    expect(await tenSubmits("203.0.113.60", () => undefined)).toEqual(limitedLikePlain);
    expect(await tenSubmits("203.0.113.61", (i) => `198.51.100.${i + 1}`)).toEqual(limitedLikePlain);
  });

  it("hops = 1: forged entries left of our proxy's are ignored", async () => {
    process.env.TRUST_PROXY_HOPS = "1";
    resetEnvForTests();
    try {
      // The proxy's own socket is the peer; it appends the real client (203.0.113.70) last.
      expect(await tenSubmits("192.0.2.250", (i) => `198.51.100.${i + 1}, 203.0.113.70`)).toEqual(limitedLikePlain);
      // A different real client behind the same proxy has its own allowance.
      expect((await tenSubmits("192.0.2.250", () => "203.0.113.71"))[0]).toBe(400);
    } finally {
      delete process.env.TRUST_PROXY_HOPS;
      resetEnvForTests();
    }
  });

  it("sign-in attempts are limited per client too, forged headers or not", async () => {
    const statuses: number[] = [];
    for (let i = 0; i < 22; i++) {
      const response = await authPost(
        new Request(`${ORIGIN()}/api/auth/sign-in/email`, {
          method: "POST",
          headers: {
            "content-type": "application/json",
            origin: ORIGIN(),
            ...fromClient("203.0.113.80"),
            "x-forwarded-for": `198.51.100.${i + 1}`,
          },
          body: JSON.stringify({ email: "nobody@example.test", password: "wrong-password-123" }),
        }),
      );
      statuses.push(response.status);
    }
    // 20 per 15 minutes (app/api/auth/[...all]/route.ts): 20 refusals of the password, then 429.
    expect(statuses.slice(0, 20).every((s) => s === 401)).toBe(true);
    expect(statuses.slice(20)).toEqual([429, 429]);
  });
});
