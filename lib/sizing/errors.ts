/** One bad field: `path` is dotted ("rider.massKg", "bike.rear.leverageCurve.2.ratio"). */
export interface SizingIssue {
  path: string;
  message: string;
}

/** Thrown for any input the engine refuses; `issues` names every bad field. */
export class SizingInputError extends Error {
  readonly issues: SizingIssue[];
  constructor(issues: SizingIssue[]) {
    super("Invalid sizing input: " + issues.map((i) => (i.path ? `${i.path}: ${i.message}` : i.message)).join("; "));
    this.name = "SizingInputError";
    this.issues = issues;
  }
}

export function pathOf(path: readonly PropertyKey[]): string {
  return path.map((p) => String(p)).join(".");
}

/** Guard for the standalone helpers: every named number must be finite and, if asked, positive. */
export function requireNumbers(args: object, rules: Record<string, "finite" | "positive" | "nonnegative">): void {
  const issues: SizingIssue[] = [];
  const bag = (args ?? {}) as Record<string, unknown>;
  for (const [key, rule] of Object.entries(rules)) {
    const v = bag[key];
    if (typeof v !== "number" || !Number.isFinite(v)) issues.push({ path: key, message: "Must be a finite number" });
    else if (rule === "positive" && !(v > 0)) issues.push({ path: key, message: "Must be greater than 0" });
    else if (rule === "nonnegative" && v < 0) issues.push({ path: key, message: "Must be 0 or more" });
  }
  if (issues.length) throw new SizingInputError(issues);
}
