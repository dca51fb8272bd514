"use client";

import { Button } from "@/components/ui/button";

export default function ShopError({ reset }: { error: Error; reset: () => void }) {
  return (
    <div role="alert" className="rounded-xl border border-red-200 bg-red-50 p-6">
      <h1 className="text-lg font-semibold text-red-900">This page could not load</h1>
      <p className="mt-1 text-red-800">Nothing you saved is lost. Try again in a moment.</p>
      <Button className="mt-4" onClick={reset}>
        Try again
      </Button>
    </div>
  );
}
