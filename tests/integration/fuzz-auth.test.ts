// better-auth's public endpoints as the app mounts them (app/api/auth/[...all]/route.ts): at least
// 1,000 generated bodies each, 0 × 5xx, and a refused body writes no row (tests/helpers/fuzz.ts).
import fc from "fast-check";
import { describe, it } from "vitest";
import { GET as authGet, POST as authPost } from "@/app/api/auth/[...all]/route";
import { setupTestApp } from "../helpers/app";
import { ORIGIN } from "../helpers/auth";
import { bodiesAround, expectNo5xx, hostileString, json, nextClient } from "../helpers/fuzz";

setupTestApp({ seed: true });

describe("fuzzing the sign-in endpoints: 0 × 5xx, 0 rows for refused bodies", { timeout: 300_000 }, () => {
  it("POST /api/auth/sign-in/email", async () => {
    const valid = { email: "owner@sagwise.test", password: "not-the-password" };
    await expectNo5xx(bodiesAround(valid), (body) => authPost(json("/api/auth/sign-in/email", body)));
  });
  it("POST /api/auth/sign-in/magic-link", async () => {
    const valid = { email: "fuzz.rider@example.test", callbackURL: "/my-requests" };
    // A well-formed e-mail gets a link (a verification row): that is the endpoint's job.
    await expectNo5xx(bodiesAround(valid), (body) => authPost(json("/api/auth/sign-in/magic-link", body)), {
      allowWrites: (s) => s === 200,
    });
  });
  it("GET /api/auth/magic-link/verify", async () => {
    const query = fc
      .tuple(hostileString, hostileString)
      .map(([token, callbackURL]) => JSON.stringify({ token, callbackURL }));
    await expectNo5xx(query, (encoded) => {
      const { token, callbackURL } = JSON.parse(encoded) as Record<string, string>;
      const url = new URL(`${ORIGIN()}/api/auth/magic-link/verify`);
      url.searchParams.set("token", token!);
      url.searchParams.set("callbackURL", callbackURL!);
      return authGet(new Request(url, { headers: { origin: ORIGIN(), ...nextClient() } }));
    });
  });
});
