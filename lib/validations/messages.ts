// Plain words for the errors zod writes itself (a missing choice, a wrong type), used by the form
// and the server alike. Messages a schema sets on a field always win over these.
import type { z } from "zod";

export const friendlyError: z.core.$ZodErrorMap = (issue) => {
  if (issue.code === "invalid_value") return "Choose one of the options";
  if (issue.code === "invalid_type") {
    if (issue.input === undefined || issue.input === null || issue.input === "") return "This is required";
    if (issue.expected === "number") return "Enter a number";
  }
  return undefined;
};
