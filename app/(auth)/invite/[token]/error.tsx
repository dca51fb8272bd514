"use client";

import { Button } from "@/components/ui/button";

export default function InviteError({ reset }: { error: Error; reset: () => void }) {
  return (
    <div role="alert" className="rounded-xl border border-red-200 bg-red-50 p-6">
      <h1 className="text-lg font-semibold text-red-900">The invitation could not be opened</h1>
      <p className="mt-1 text-red-800">Try again in a moment; the link stays valid until it expires.</p>
      <Button className="mt-4" onClick={reset}>
        Try again
      </Button>
    </div>
  );
}
