// A rider's answers for a request a test submits itself: one of the seeded demo requests' answers
// (the invented scenario in db/seed-data.ts), on the same generic catalog bike, under a rider of the
// test's own, so no test changes a seeded request another test reads.
import { DEMO_REQUESTS, stableUuid } from "@/db/seed-data";
import type { RequestAnswersInput } from "@/lib/validations/request";

export function answersLike(key: string, rider: { name: string; email: string }): RequestAnswersInput {
  const demo = DEMO_REQUESTS.find((r) => r.key === key);
  if (!demo) throw new Error(`No demo request ${key}`);
  return {
    ...demo.answers,
    rider: { ...demo.answers.rider, ...rider },
    bike: { ...demo.answers.bike, modelId: stableUuid(`bike:${demo.bikeClass}`) },
  };
}
