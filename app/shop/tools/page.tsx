import type { Metadata } from "next";
import { CoilSpringTool } from "@/components/tools/coil-spring-tool";
import { LoadTestTool } from "@/components/tools/load-test-tool";
import { RateConverter } from "@/components/tools/rate-converter";
import { requireRole } from "@/lib/auth/guard";
import { STAFF_ROLES } from "@/lib/auth/roles";

export const metadata: Metadata = { title: "Workshop tools" };
// Signed-in pages render per request (the guard reads the session cookie).
export const dynamic = "force-dynamic";

export default async function ToolsPage() {
  await requireRole(STAFF_ROLES, { page: "/shop/tools" });
  return (
    <div className="flex flex-col gap-4">
      <h1 className="text-2xl font-bold">Workshop tools</h1>
      <p className="rounded-lg bg-amber-soft p-3 text-sm text-stone-800">
        Springs and gas-charged shocks store energy. Use a proper spring compressor, release the gas charge only as the
        manufacturer&apos;s service manual says, follow local rules, or have a qualified technician do the work.
      </p>
      <div className="grid grid-cols-1 gap-4 lg:grid-cols-2">
        <CoilSpringTool />
        <div className="flex flex-col gap-4">
          <LoadTestTool />
          <RateConverter />
        </div>
      </div>
    </div>
  );
}
