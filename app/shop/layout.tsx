import Link from "next/link";
import type { ReactNode } from "react";
import { SignOutButton } from "@/components/auth/sign-out-button";
import { Providers } from "@/components/providers";
import { ShopNav, type NavItem } from "@/components/shop/shop-nav";
import { Logo } from "@/components/ui/logo";
import { requireRole } from "@/lib/auth/guard";
import { STAFF_ROLES, type Role } from "@/lib/auth/roles";
import { countUnseenNotices } from "@/db/queries/notices";
import { STAFF_NOTICE_KINDS } from "@/db/schema";
import { STAFF_NOTICE_LABELS, roleLabel } from "@/lib/labels";

/** "2 new requests, 1 new sag report" for the count's accessible name. */
function noticeSummary(unseen: Record<string, number>): string {
  const parts = STAFF_NOTICE_KINDS.filter((k) => unseen[k]).map(
    (k) => `${unseen[k]} × ${STAFF_NOTICE_LABELS[k]!.toLowerCase()}`,
  );
  return parts.length ? `unseen: ${parts.join(", ")}` : "";
}

// Link only pages that exist; `roles` lists who sees the link (the pages guard themselves too).
const SHOP_NAV: (NavItem & { roles: readonly Role[] })[] = [
  { href: "/shop", label: "Queue", roles: STAFF_ROLES },
  { href: "/shop/workshop", label: "Workshop", roles: STAFF_ROLES },
  { href: "/shop/catalog", label: "Catalog", roles: STAFF_ROLES },
  { href: "/shop/stock", label: "Stock", roles: STAFF_ROLES },
  { href: "/shop/emails", label: "E-mails", roles: STAFF_ROLES },
  { href: "/shop/tools", label: "Tools", roles: STAFF_ROLES },
  { href: "/shop/service", label: "Due soon", roles: STAFF_ROLES },
  { href: "/shop/targets", label: "Targets", roles: ["admin"] },
  { href: "/shop/team", label: "Team", roles: ["admin"] },
  { href: "/shop/settings", label: "Settings", roles: ["admin"] },
];

export default async function ShopLayout({ children }: { children: ReactNode }) {
  const user = await requireRole(STAFF_ROLES, { page: "/shop" });
  const unseen = await countUnseenNotices();
  const items = SHOP_NAV.filter((item) => item.roles.includes(user.role)).map(({ href, label }) =>
    href === "/shop" ? { href, label, count: unseen.total, countLabel: noticeSummary(unseen) } : { href, label },
  );
  return (
    <div className="flex min-h-dvh flex-col">
      <header className="bg-pine-900 text-white">
        <div className="mx-auto flex max-w-7xl flex-wrap items-center gap-4 px-4 py-2">
          <Link href="/shop" className="inline-flex min-h-11 items-center">
            <Logo />
          </Link>
          <ShopNav items={items} />
          <div className="ml-auto flex items-center gap-2 text-sm">
            <span>
              {user.name} <span className="text-pine-100">({roleLabel(user.role)})</span>
            </span>
            <SignOutButton />
          </div>
        </div>
      </header>
      <main className="mx-auto w-full max-w-7xl flex-1 px-4 py-6">
        <Providers>{children}</Providers>
      </main>
    </div>
  );
}
