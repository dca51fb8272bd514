"use client";

import Link from "next/link";
import { Button } from "@/components/ui/button";

export default function RequestError({ reset }: { error: Error; reset: () => void }) {
  return (
    <div role="alert" className="rounded-xl border border-red-200 bg-red-50 p-6">
      <h1 className="text-lg font-semibold text-red-900">This request could not load</h1>
      <p className="mt-1 text-red-800">Nothing saved is lost. Try again, or go back to the queue.</p>
      <div className="mt-4 flex gap-3">
        <Button onClick={reset}>Try again</Button>
        <Link href="/shop" className="inline-flex min-h-11 items-center text-pine-700 underline">
          Back to the queue
        </Link>
      </div>
    </div>
  );
}
