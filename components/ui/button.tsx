import type { ButtonHTMLAttributes } from "react";
import { cn } from "./cn";

type Variant = "primary" | "secondary" | "ghost" | "danger";

const variants: Record<Variant, string> = {
  primary: "bg-pine-700 text-white hover:bg-pine-800 disabled:bg-stone-400",
  secondary: "border border-stone-300 bg-white text-stone-900 hover:bg-stone-100 disabled:text-stone-400",
  ghost: "text-pine-700 hover:bg-pine-50",
  danger: "bg-red-700 text-white hover:bg-red-800 disabled:bg-stone-400",
};

export function buttonClass(variant: Variant = "primary", extra = ""): string {
  return cn(
    "inline-flex min-h-11 items-center justify-center gap-2 rounded-lg px-4 py-2 text-base font-semibold transition-colors disabled:cursor-not-allowed",
    variants[variant],
    extra,
  );
}

export function Button({
  variant = "primary",
  className = "",
  type = "button",
  ...props
}: ButtonHTMLAttributes<HTMLButtonElement> & { variant?: Variant }) {
  return <button type={type} className={buttonClass(variant, className)} {...props} />;
}
