// A caller's className overrides the primitive's default of the same kind instead of both landing
// in the markup (tailwind-merge: "the last conflicting class wins"; clsx drops falsy parts).
import { describe, expect, it } from "vitest";
import { buttonClass } from "@/components/ui/button";
import { cn } from "@/components/ui/cn";

describe("class names", () => {
  it("a larger button keeps one height and one text size", () => {
    const classes = buttonClass("primary", "min-h-12 text-lg").split(" ");
    expect(classes).toContain("min-h-12");
    expect(classes).not.toContain("min-h-11");
    expect(classes).toContain("text-lg");
    expect(classes).not.toContain("text-base");
    expect(classes).toContain("bg-pine-700");
  });

  it("drops falsy parts and keeps unrelated classes", () => {
    expect(cn("flex gap-1", false, undefined, "gap-3 mt-2")).toBe("flex gap-3 mt-2");
  });
});
