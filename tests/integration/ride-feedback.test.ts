// After the first rides: the rider says how the bike rides now on the status page; the engine's
// clicker rules propose the next step from the fitted (approved) positions, each with its reason;
// the tuner sends the revised sheet in one step (a new approved version, e-mailed to the rider).
// Expected moves worked by hand from the default rules (lib/sizing/defaults.ts, common practice).
import { describe, expect, it } from "vitest";
import { POST as feedback } from "@/app/api/status/[id]/feedback/route";
import { POST as revise } from "@/app/api/requests/[id]/ride-revision/route";
import { findApprovedVersion } from "@/db/queries/status";
import { stableUuid } from "@/db/seed-demo";
import { resolveAuthSecret } from "@/lib/auth/secret";
import { drainOutbox } from "@/lib/mail";
import { demoStatusToken } from "@/lib/requests/token";
import { recommendationSchema } from "@/lib/sizing";
import { setupTestApp } from "../helpers/app";
import { fromClient } from "../helpers/client";
import { idContext, jsonRequest, staffCookie } from "./admin-helpers";

const app = setupTestApp({ seed: true, tempDataDir: true });
const id = (key: string) => stableUuid(`request:${key}`);
const token = (key: string) => demoStatusToken(resolveAuthSecret(), id(key));
let ip = 0;

function postFeedback(requestId: string, body: unknown) {
  const request = jsonRequest(`/api/status/${requestId}/feedback`, "POST", undefined, body);
  const headers = new Headers(request.headers);
  for (const [k, v] of Object.entries(fromClient(`10.7.${++ip >> 8}.${ip & 255}`))) headers.set(k, v);
  return feedback(new Request(request, { headers }), idContext(requestId));
}

describe("ride feedback and the one-step revision", () => {
  it("refuses feedback with nothing in it, naming the field", async () => {
    const response = await postFeedback(id("r09"), { token: token("r09"), front: [], rear: [] });
    expect(response.status).toBe(400);
    expect(((await response.json()) as { fields: Record<string, string> }).fields).toEqual({
      notes: "Tick what you feel at either end, or tell us in your words",
    });
  });

  it("refuses feedback before approval (409)", async () => {
    const response = await postFeedback(id("r01"), { token: token("r01"), front: ["bottoming"] });
    expect(response.status).toBe(409);
  });

  it("proposes from the fitted positions; the tuner's one step sends version 2 with them", async () => {
    const fitted = recommendationSchema.parse((await findApprovedVersion(id("r09")))!.output);
    const fork = fitted.clickers.find((c) => c.id === "forkCompression")!;
    const response = await postFeedback(id("r09"), {
      token: token("r09"),
      front: ["bottoming"],
      rear: [],
      notes: "Still bottoms on the big double.",
    });
    expect(response.status).toBe(201);
    const sent = (await response.json()) as {
      id: string;
      proposal: { changes: { id: string; from: number; to: number; moves: { reason: string }[] }[] };
    };
    // Bottoming at the fork: fork compression 2 clicks firmer than fitted (clamped at 0 out).
    const expected = Math.max(fork.min, fork.position - 2);
    expect(sent.proposal.changes).toEqual([
      expect.objectContaining({ id: "forkCompression", from: fork.position, to: expected }),
    ]);
    expect(sent.proposal.changes[0]!.moves[0]!.reason).toBe("Bottoming: firm fork compression 2 clicks");

    const tuner = await staffCookie("tuner@sagwise.test");
    const revised = await revise(
      jsonRequest(`/api/requests/${id("r09")}/ride-revision`, "POST", tuner, { feedbackId: sent.id }),
      idContext(id("r09")),
    );
    expect(revised.status).toBe(200);
    expect(await revised.json()).toEqual({ version: 2 });
    const now = await findApprovedVersion(id("r09"));
    expect(now!.version).toBe(2);
    const clickers = recommendationSchema.parse(now!.output).clickers;
    expect(clickers.find((c) => c.id === "forkCompression")!.position).toBe(expected);
    // The other adjusters stay where they were fitted.
    for (const c of fitted.clickers.filter((c) => c.id !== "forkCompression"))
      expect(clickers.find((x) => x.id === c.id)!.position).toBe(c.position);
    await drainOutbox({ now: new Date(Date.now() + 1000) });
    expect(app.sent.some((m) => m.subject === "Revised setup sheet (version 2) for request 9")).toBe(true);

    const again = await revise(
      jsonRequest(`/api/requests/${id("r09")}/ride-revision`, "POST", tuner, { feedbackId: sent.id }),
      idContext(id("r09")),
    );
    expect(again.status).toBe(409);
  });
});
