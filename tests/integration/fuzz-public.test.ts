// Every public endpoint of the app's own (sign-in: fuzz-auth.test.ts) answers every malformed body
// with a 4xx and writes nothing: fast-check generates at least 1,000 bodies per endpoint (mutations of a valid body, hostile strings such as
// NUL, lone surrogates and traversal names, and raw garbage). PostgreSQL refuses NUL (U+0000) in
// text and jsonb (PostgreSQL manual, "Character Types" / "JSON Types"), which is what used to answer
// 500. A 2xx body may write rows (it was valid); a refused one must leave the row total unchanged.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { POST as submit } from "@/app/api/requests/route";
import { POST as answer } from "@/app/api/status/[id]/answer/route";
import { POST as sag } from "@/app/api/status/[id]/sag/route";
import { POST as acceptInvite } from "@/app/api/invite/accept/route";
import { GET as listBikes } from "@/app/api/bikes/route";
import { stableUuid } from "@/db/seed-demo";
import { resolveAuthSecret } from "@/lib/auth/secret";
import { demoStatusToken } from "@/lib/requests/token";
import { NUL_MESSAGE } from "@/lib/validations/text";
import { setupTestApp } from "../helpers/app";
import { ORIGIN } from "../helpers/auth";
import { RUNS, bodiesAround, expectNo5xx, hostileString, json, nextClient } from "../helpers/fuzz";
import { totalRows } from "../helpers/rows";
import { tinyJpeg } from "../fixtures/images";

setupTestApp({ seed: true, tempDataDir: true });

const validAnswers = {
  rider: {
    name: "Fuzz Rider",
    email: "fuzz.rider@example.test",
    weight: { value: 80, unit: "kg" },
    gearIncluded: false,
    skill: "intermediate",
    style: "moderate",
  },
  riding: { discipline: "motocross", terrain: ["loam"], jumpSize: "medium", hoursPerMonth: 10 },
  bike: { modelId: stableUuid("bike:mx-450-4t"), year: 2023 },
  feel: { complaints: ["bottoming"], notes: "Bottoms on the big table." },
  review: { consent: true },
};
const requestId = stableUuid("request:r09");
const statusToken = () => demoStatusToken(resolveAuthSecret(), requestId);
const params = (id: string) => ({ params: Promise.resolve({ id }) });
const created = (status: number) => status === 201 || status === 200;

describe("a NUL character in a text field", () => {
  it("is refused with 400 naming the field, and nothing is stored", async () => {
    const before = await totalRows();
    const body = { ...validAnswers, rider: { ...validAnswers.rider, name: "Fuzz\u0000Rider" } };
    const response = await submit(json("/api/requests", JSON.stringify(body)), undefined as never);
    expect(response.status).toBe(400);
    const answer = (await response.json()) as { fields: Record<string, string> };
    expect(answer.fields["rider.name"]).toBe(NUL_MESSAGE);
    expect(await totalRows()).toBe(before);
  });
});

describe("fuzzing the public endpoints: 0 × 5xx, 0 rows for refused bodies", { timeout: 300_000 }, () => {
  it("POST /api/requests (JSON)", async () => {
    const tally = await expectNo5xx(
      bodiesAround(validAnswers),
      (body) => submit(json("/api/requests", body), undefined as never),
      { allowWrites: created },
    );
    expect(tally.get(400) ?? 0).toBeGreaterThan(RUNS / 2);
  });

  it("POST /api/requests (multipart, with photo parts)", async () => {
    const photo = fc.record({
      name: hostileString,
      bytes: fc.oneof(fc.uint8Array({ maxLength: 64 }), fc.constant(tinyJpeg())),
    });
    const arbitrary = fc
      .tuple(bodiesAround(validAnswers), fc.array(photo, { maxLength: 2 }), fc.boolean())
      .map(([answers, photos, withAnswers]) =>
        JSON.stringify({
          answers,
          photos: photos.map((p) => ({ name: p.name, bytes: Array.from(p.bytes) })),
          withAnswers,
        }),
      );
    await expectNo5xx(
      arbitrary,
      (encoded) => {
        const {
          answers: raw,
          photos,
          withAnswers,
        } = JSON.parse(encoded) as {
          answers: string;
          photos: { name: string; bytes: number[] }[];
          withAnswers: boolean;
        };
        const form = new FormData();
        if (withAnswers) form.set("answers", raw);
        for (const p of photos)
          form.append("photos", new File([new Uint8Array(p.bytes)], p.name, { type: "image/jpeg" }));
        return submit(
          new Request(`${ORIGIN()}/api/requests`, { method: "POST", headers: nextClient(), body: form }),
          undefined as never,
        );
      },
      { allowWrites: created },
    );
  });

  it("POST /api/status/:id/answer", async () => {
    const id = fc.oneof({ weight: 4, arbitrary: fc.constant(requestId) }, { weight: 1, arbitrary: hostileString });
    const arbitrary = fc
      .tuple(id, bodiesAround({ token: statusToken(), body: "The bike is stock apart from the bars." }))
      .map((t) => JSON.stringify(t));
    await expectNo5xx(
      arbitrary,
      (encoded) => {
        const [target, body] = JSON.parse(encoded) as [string, string];
        return answer(json(`/api/status/x/answer`, body), params(target));
      },
      { allowWrites: created },
    );
  });

  it("POST /api/status/:id/sag", async () => {
    const id = fc.oneof({ weight: 4, arbitrary: fc.constant(requestId) }, { weight: 1, arbitrary: hostileString });
    const valid = {
      token: statusToken(),
      unit: "mm",
      front: { static: 30, race: 70 },
      rear: { free: 10, static: 35, race: 105 },
    };
    const arbitrary = fc.tuple(id, bodiesAround(valid)).map((t) => JSON.stringify(t));
    await expectNo5xx(
      arbitrary,
      (encoded) => {
        const [target, body] = JSON.parse(encoded) as [string, string];
        return sag(json(`/api/status/x/sag`, body), params(target));
      },
      { allowWrites: created },
    );
  });

  it("POST /api/invite/accept", async () => {
    const valid = { token: "a".repeat(43), name: "New Tuner", password: "long-enough-password" };
    await expectNo5xx(bodiesAround(valid), (body) =>
      acceptInvite(json("/api/invite/accept", body), undefined as never),
    );
  });

  it("GET /api/bikes?q=", async () => {
    await expectNo5xx(
      hostileString,
      (q) => {
        const url = new URL(`${ORIGIN()}/api/bikes`);
        url.searchParams.set("q", q);
        return listBikes(new Request(url, { headers: nextClient() }), undefined as never);
      },
      { allowWrites: () => false },
    );
  });
});
