"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";
import { cn } from "@/components/ui/cn";

export interface NavItem {
  href: string;
  label: string;
  /** Unseen notices behind this link (the queue's new requests, answers, sag reports, payments). */
  count?: number;
  countLabel?: string;
}

/** Workspace navigation; the layout passes only pages that exist and that the role may open. */
export function ShopNav({ items }: { items: NavItem[] }) {
  const pathname = usePathname();
  return (
    <nav aria-label="Workspace" className="flex flex-wrap gap-1">
      {items.map((item) => {
        const active = item.href === "/shop" ? pathname === "/shop" : pathname.startsWith(item.href);
        return (
          <Link
            key={item.href}
            href={item.href}
            aria-current={active ? "page" : undefined}
            className={cn(
              "inline-flex min-h-11 items-center rounded-lg px-3 text-sm font-medium",
              active ? "bg-white text-pine-900" : "text-pine-50 hover:bg-pine-800",
            )}
          >
            {item.label}
            {item.count ? (
              <span
                className="ml-1.5 rounded-full bg-amber-300 px-1.5 text-xs font-bold text-stone-950 tabular-nums"
                title={item.countLabel}
              >
                {item.count}
                <span className="sr-only"> {item.countLabel}</span>
              </span>
            ) : null}
          </Link>
        );
      })}
    </nav>
  );
}
