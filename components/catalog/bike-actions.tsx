"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { callApi } from "@/lib/api-client";

/** Duplicate a model, or retire it / bring it back. */
export function BikeActions({ id, retired }: { id: string; retired: boolean }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const run = async (url: string, body?: unknown, go?: (data: { id: string }) => string) => {
    setError(null);
    const result = await callApi<{ id: string }>(url, "POST", body);
    if (!result.ok) return setError(result.error);
    if (go) router.push(go(result.data));
    router.refresh();
  };
  return (
    <div className="flex flex-wrap items-center gap-2">
      <Button
        variant="secondary"
        onClick={() => run(`/api/shop/catalog/${id}/duplicate`, undefined, (d) => `/shop/catalog/${d.id}`)}
      >
        Duplicate
      </Button>
      <Button
        variant={retired ? "secondary" : "danger"}
        onClick={() => run(`/api/shop/catalog/${id}/retire`, { retired: !retired })}
      >
        {retired ? "Bring back to the picker" : "Retire"}
      </Button>
      {error ? (
        <p role="alert" className="text-sm text-red-800">
          {error}
        </p>
      ) : null}
    </div>
  );
}
