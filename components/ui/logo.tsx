// Sagwise's own mark: a spring drawn as a zig-zag under a bar, in SVG.
import { cn } from "./cn";

export function Logo({ className = "" }: { className?: string }) {
  return (
    <span className={cn("inline-flex items-center gap-2 font-bold tracking-tight", className)}>
      <svg aria-hidden="true" viewBox="0 0 24 24" className="h-6 w-6" fill="none">
        <rect x="3" y="2" width="18" height="3" rx="1.5" fill="currentColor" />
        <path
          d="M6 8 L18 10.5 L6 13 L18 15.5 L6 18 L18 20.5"
          stroke="currentColor"
          strokeWidth="2"
          strokeLinecap="round"
          strokeLinejoin="round"
        />
      </svg>
      Sagwise
    </span>
  );
}
