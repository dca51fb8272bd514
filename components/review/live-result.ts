// Recomputing in the browser: lib/sizing is pure TypeScript and evaluates in well under a
// millisecond, so every keystroke re-runs the engine; the server runs it again on save.
import {
  SizingInputError,
  evaluateSetup,
  type Recommendation,
  type SetupOverrides,
  type SizingInput,
} from "@/lib/sizing";

export type LiveResult = { ok: true; rec: Recommendation } | { ok: false; errors: Record<string, string> };

export function evaluateLive(input: SizingInput, overrides: SetupOverrides): LiveResult {
  try {
    return { ok: true, rec: evaluateSetup(input, overrides) };
  } catch (error) {
    if (error instanceof SizingInputError)
      return {
        ok: false,
        errors: Object.fromEntries(error.issues.map((i) => [i.path.replace(/^overrides\./, ""), i.message])),
      };
    throw error;
  }
}
