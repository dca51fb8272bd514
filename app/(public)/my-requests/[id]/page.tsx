import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { StatusView } from "@/components/status/status-view";
import { findRequestForViewer, loadRiderStatus } from "@/db/queries/status";
import { requireSession } from "@/lib/auth/guard";
import { isUuid } from "@/lib/validations/id";
import { loadServiceOverview } from "@/lib/service/overview";

export const metadata: Metadata = { title: "Your request", robots: { index: false, follow: false } };
export const dynamic = "force-dynamic";

export default async function MyRequestPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requireSession({ page: `/my-requests/${id}` });
  // Only a request made with the signed-in e-mail opens: the check is in the query.
  const requestId = isUuid(id) ? await findRequestForViewer({ email: user.email }, id) : null;
  if (!requestId) notFound();
  const data = await loadRiderStatus(requestId);
  if (!data) notFound();
  return (
    <div className="flex flex-col gap-4">
      <Link href="/my-requests" className="inline-flex min-h-11 items-center font-semibold text-pine-700 underline">
        All my requests
      </Link>
      <StatusView data={data} service={await loadServiceOverview(requestId)} />
    </div>
  );
}
