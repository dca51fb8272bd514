// Class names from parts: clsx drops the falsy ones, tailwind-merge lets a later Tailwind class win
// over an earlier one of the same kind (`min-h-11` then `min-h-12` gives `min-h-12`), so a caller's
// `className` overrides a primitive's default instead of both landing in the markup.
import { clsx, type ClassValue } from "clsx";
import { twMerge } from "tailwind-merge";

export function cn(...parts: ClassValue[]): string {
  return twMerge(clsx(parts));
}
