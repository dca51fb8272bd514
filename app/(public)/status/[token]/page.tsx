import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { StatusView } from "@/components/status/status-view";
import { findRequestForViewer, loadRiderStatus, touchStatusToken } from "@/db/queries/status";
import { loadServiceOverview } from "@/lib/service/overview";

// The token is the rider's key: keep the page out of search engines and the token out of Referer.
export const metadata: Metadata = {
  title: "Your request",
  robots: { index: false, follow: false },
  referrer: "no-referrer",
};
export const dynamic = "force-dynamic";

export default async function StatusPage({
  params,
  searchParams,
}: {
  params: Promise<{ token: string }>;
  searchParams: Promise<{ sent?: string }>;
}) {
  const { token } = await params;
  const requestId = await findRequestForViewer({ token });
  if (!requestId) notFound();
  const data = await loadRiderStatus(requestId);
  if (!data) notFound();
  await touchStatusToken(token).catch(() => undefined);
  return (
    <StatusView
      data={data}
      token={token}
      justSent={(await searchParams).sent === "1"}
      service={await loadServiceOverview(requestId)}
    />
  );
}
