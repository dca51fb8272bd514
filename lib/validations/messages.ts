// Plain words for the errors zod writes itself (a missing answer, a wrong type), used by the form
// and the server alike. Messages a schema sets on a field always win over these.
import type { z } from "zod";

// A missing answer, named by its field (the last part of its path).
const MISSING: Record<string, string> = {
  name: "Enter your name",
  email: "Enter your e-mail address",
  weight: "Enter your weight",
  skill: "Choose your skill level",
  style: "Choose your riding style",
  discipline: "Choose what you ride most",
  jumpSize: "Choose the jumps you usually take",
  description: "Describe the bike (make, size, type)",
  rearWheelTravel: "Enter the rear wheel travel",
  forkTravel: "Enter the fork travel",
  consent: "Agree to be contacted about this request",
  static: "Enter the static sag",
  race: "Enter the race sag",
  body: "Write your answer",
};

export const friendlyError: z.core.$ZodErrorMap = (issue) => {
  const path = issue.path ?? [];
  const last = String(path.at(-1) ?? "");
  const parent = String(path.at(-2) ?? "");
  const missing = issue.input === undefined || issue.input === null || issue.input === "";
  if (missing && (issue.code === "invalid_type" || issue.code === "invalid_value")) {
    if (MISSING[last]) return MISSING[last];
    if (last === "value") return MISSING[parent] ?? "Enter a number";
    return "This is required";
  }
  if (issue.code === "invalid_value") return "Choose one of the options";
  if (issue.code === "invalid_type" && issue.expected === "number") return "Enter a number";
  return undefined;
};
