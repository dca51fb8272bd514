"use client";

// One pattern for the order page's forms: send through the API client, refresh the page's data on
// success, keep the server's message and per-field messages otherwise (the inputs keep their values).
import { useRouter } from "next/navigation";
import { useState } from "react";
import { callApi, type FieldErrors } from "@/lib/api-client";

export function useOrderAction() {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const [fields, setFields] = useState<FieldErrors>({});
  const [done, setDone] = useState<string | null>(null);

  async function send(url: string, method: string, body: unknown, success: string) {
    setBusy(true);
    setProblem(null);
    setFields({});
    setDone(null);
    const result = await callApi(url, method, body, {
      offline: "No connection: nothing was saved. Your entries are still here.",
    });
    setBusy(false);
    if (!result.ok) {
      setProblem(result.error);
      setFields(result.fields);
      return false;
    }
    setDone(success);
    router.refresh();
    return true;
  }
  return { busy, problem, fields, done, send };
}
