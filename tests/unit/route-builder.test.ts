// The one route builder (lib/api/route.ts) and the one error mapping (lib/api/respond.ts): params,
// query and body by schema, an empty body read as {}, and each domain error answered with the status
// whose meaning RFC 9110 §15 defines for it (400 content the server will not process, 403 refused
// although authenticated, 404 no current representation, 409 conflict with the resource's state,
// 413 content larger than the server is willing to process, 500 unexpected condition).
import { describe, expect, it, vi } from "vitest";
import { z } from "zod";
import { idParams, json, route } from "@/lib/api/route";
import { ConflictError, ForbiddenError, NotFoundError, TooLargeError, ValidationError } from "@/lib/errors";

const ID = "6f1c2a4e-9b3d-4c5e-8f7a-1b2c3d4e5f60";
const ctx = (id: string) => ({ params: Promise.resolve({ id }) });
const post = (body?: string, path = `/x/${ID}`) =>
  new Request(`http://localhost${path}`, { method: "POST", headers: { "content-type": "application/json" }, body });

const optionalBody = route(
  {
    access: "public",
    params: idParams,
    notFound: "No such request.",
    body: z.object({ version: z.number().int().optional() }),
  },
  async ({ params, body }) => json({ id: params.id, body }),
);

describe("route(): body", () => {
  it("accepts an empty body as {} when every field is optional (an empty POST to approve)", async () => {
    for (const body of [undefined, "", "  \n"]) {
      const response = await optionalBody(post(body), ctx(ID));
      expect(response.status).toBe(200);
      expect(await response.json()).toEqual({ id: ID, body: {} });
    }
  });

  it("answers 400 for a body that is not JSON, never 500", async () => {
    const response = await optionalBody(post("{version: 1"), ctx(ID));
    expect(response.status).toBe(400);
    expect(await response.json()).toEqual({ error: "Send the form as JSON." });
  });

  it("answers 400 naming the field when the schema refuses it", async () => {
    const response = await optionalBody(post(JSON.stringify({ version: 1.5 })), ctx(ID));
    expect(response.status).toBe(400);
    const body = await response.json();
    expect(Object.keys(body.fields)).toEqual(["version"]);
  });

  it("answers 400 naming a required field missing from an empty body", async () => {
    const required = route(
      { access: "public", body: z.object({ reason: z.string({ error: "Give a reason" }) }) },
      async () => json({}),
    );
    const response = await required(post(""));
    expect(response.status).toBe(400);
    expect((await response.json()).fields).toEqual({ reason: "Give a reason" });
  });
});

describe("route(): params and query", () => {
  it("answers 404 with the route's own words when the id cannot name a record", async () => {
    const response = await optionalBody(post(""), ctx("not-a-uuid"));
    expect(response.status).toBe(404);
    expect(await response.json()).toEqual({ error: "No such request." });
  });

  it("lower-cases a uuid id as the database stores it", async () => {
    const response = await optionalBody(post(""), ctx(ID.toUpperCase()));
    expect((await response.json()).id).toBe(ID);
  });

  it("parses the query string by schema (400 naming the field)", async () => {
    const handler = route(
      { access: "public", query: z.object({ page: z.coerce.number().int("Whole number") }) },
      async ({ query }) => json(query),
    );
    expect(await (await handler(new Request("http://localhost/x?page=3"))).json()).toEqual({ page: 3 });
    const bad = await handler(new Request("http://localhost/x?page=2.5"));
    expect(bad.status).toBe(400);
    expect((await bad.json()).fields).toEqual({ page: "Whole number" });
  });

  it("runs the rate limit before reading anything", async () => {
    const limit = vi.fn(async () => {
      throw new ConflictError("limited");
    });
    const handler = route({ access: "public", limit, body: z.object({}) }, async () => json({}));
    expect((await handler(post("not json"))).status).toBe(409);
    expect(limit).toHaveBeenCalledOnce();
  });
});

describe("withErrors: domain errors to HTTP, once", () => {
  const throwing = (error: unknown) => route({ access: "public" }, async () => Promise.reject(error));
  const cases: [unknown, number][] = [
    [new ValidationError("Check the figures.", { "rear.rateNmm": "Too soft" }), 400],
    [new ForbiddenError("This request is not yours."), 403],
    [new NotFoundError("No such spring."), 404],
    [new ConflictError("Already approved."), 409],
    [new TooLargeError("The file is larger than 2 MB."), 413],
  ];
  it.each(cases)("%s answers %i with its message and fields", async (error, status) => {
    const response = await throwing(error)(post());
    expect(response.status).toBe(status);
    const e = error as ValidationError;
    expect(await response.json()).toEqual({ error: e.message, ...(e.fields ? { fields: e.fields } : {}) });
  });

  it("answers 500 without the details of an unexpected error", async () => {
    const log = vi.spyOn(console, "error").mockImplementation(() => {});
    const response = await throwing(new Error('relation "secret_table" does not exist'))(post());
    expect(response.status).toBe(500);
    expect(JSON.stringify(await response.json())).not.toContain("secret_table");
    log.mockRestore();
  });
});
