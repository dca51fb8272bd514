import { notFound } from "next/navigation";
import type { ReactNode } from "react";
import { findRequestForViewer } from "@/db/queries/status";
import { requireSession } from "@/lib/auth/guard";
import { isUuid } from "@/lib/validations/id";

// A request this e-mail did not make answers 404 with the friendly page (../not-found.tsx). The
// check sits in the layout, outside this segment's loading boundary, so the status is sent as 404
// rather than streamed after a 200.
export default async function MyRequestLayout({
  children,
  params,
}: {
  children: ReactNode;
  params: Promise<{ id: string }>;
}) {
  const { id } = await params;
  const user = await requireSession({ page: `/my-requests/${id}` });
  if (!isUuid(id) || !(await findRequestForViewer({ email: user.email }, id))) notFound();
  return children;
}
