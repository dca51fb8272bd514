// The one horizontal scroller of the staff pages: a table or a chart wider than a phone scrolls
// inside this box instead of pushing the page wider than the screen. It is focusable and named,
// so a keyboard can scroll it too (WCAG 2.1.1; axe-core "scrollable-region-focusable"). It is the
// containing block of what is positioned inside it (screen-reader-only text is absolutely placed),
// so nothing escapes its clipping and widens the page.
import type { HTMLAttributes, ReactNode } from "react";
import { cn } from "./cn";

export function ScrollBox({
  label,
  className,
  children,
  ...rest
}: { label: string; className?: string; children: ReactNode } & Omit<
  HTMLAttributes<HTMLDivElement>,
  "role" | "tabIndex" | "aria-label"
>) {
  return (
    <div
      {...rest}
      role="group"
      tabIndex={0}
      aria-label={`${label} (scrolls sideways)`}
      className={cn("relative max-w-full overflow-x-auto", className)}
    >
      {children}
    </div>
  );
}
