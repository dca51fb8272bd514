import type { Recommendation } from "./output-schema";
import type { SizingInput } from "./input-schema";
import { evaluateSetup } from "./evaluate";

/** The whole recommendation for one rider on one bike under the shop's targets and stock. */
export function recommend(input: SizingInput): Recommendation {
  return evaluateSetup(input, {});
}
