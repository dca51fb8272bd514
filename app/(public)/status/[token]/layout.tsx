import { notFound } from "next/navigation";
import type { ReactNode } from "react";
import { findRequestForViewer } from "@/db/queries/status";

// An unknown link answers 404 with the friendly page (../not-found.tsx). The check sits in the
// layout, outside this segment's loading boundary: a page under a loading skeleton starts streaming
// with 200 before it can say "not found".
export default async function StatusTokenLayout({
  children,
  params,
}: {
  children: ReactNode;
  params: Promise<{ token: string }>;
}) {
  const { token } = await params;
  if (!(await findRequestForViewer({ token }))) notFound();
  return children;
}
