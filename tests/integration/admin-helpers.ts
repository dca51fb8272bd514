// Shared by the admin-*.test.ts files: signing in the seeded staff, JSON requests to route handlers,
// and a bike spec with a progressive curve whose stroke is known in closed form.
import { ORIGIN, cookieFrom, signInStaff } from "../helpers/auth";
import type { BikeSpecInput } from "@/lib/sizing";
import { sizingDefaults } from "@/lib/sizing";

export const DEMO_PASSWORD = "sagwise-demo";

export async function staffCookie(email: string, password = DEMO_PASSWORD): Promise<string> {
  const response = await signInStaff(email, password);
  if (response.status !== 200) throw new Error(`sign-in of ${email} answered ${response.status}`);
  return cookieFrom(response);
}

export function jsonRequest(path: string, method: string, cookie: string | undefined, body?: unknown): Request {
  return new Request(`${ORIGIN()}${path}`, {
    method,
    headers: {
      ...(cookie ? { cookie } : {}),
      ...(body !== undefined ? { "content-type": "application/json" } : {}),
      origin: ORIGIN(),
    },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
}

export const idContext = (id: string) => ({ params: Promise.resolve({ id }) });

/**
 * Leverage ratio falling linearly from 3.0 to 2.0 over 300 mm of wheel travel (progressive).
 * Shock travel x(y) = ∫₀^y du / (3 − u/300) = 300·ln(3 / (3 − y/300)) (calculus; the leverage ratio
 * is dy/dx by definition), so the stroke is 300·ln 1.5 = 121.64 mm.
 */
export const LR = (y: number) => 3 - y / 300;
export const shockTravelExact = (y: number) => 300 * Math.log(3 / LR(y));
export const PROGRESSIVE_STROKE_MM = Math.round(shockTravelExact(300) * 100) / 100;

export function progressiveSpec(): BikeSpecInput {
  const base = structuredClone(sizingDefaults.GENERIC_BIKE_CLASSES[0]!.spec);
  base.rear = {
    ...base.rear,
    wheelTravelMm: 300,
    shockStrokeMm: PROGRESSIVE_STROKE_MM,
    leverageCurve: [0, 100, 200, 300].map((y) => ({ wheelTravelMm: y, ratio: Math.round(LR(y) * 10000) / 10000 })),
  };
  return base;
}

export const newModel = (over: Record<string, unknown> = {}) => ({
  name: "Test 350 four-stroke enduro",
  bikeClass: "enduro-350-4t",
  yearFrom: 2024,
  spec: progressiveSpec(),
  ...over,
});

/** Route handlers without route params take an unused second argument. */
export const noCtx = (handler: (request: Request, context: never) => Promise<Response>) => (request: Request) =>
  handler(request, undefined as never);
