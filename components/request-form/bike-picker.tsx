"use client";

// Searches the shop's catalog (GET /api/bikes) as the rider types; "not listed" is always offered.
import { useQuery } from "@tanstack/react-query";
import { useDeferredValue, useState } from "react";
import type { UseFormRegisterReturn } from "react-hook-form";
import { ErrorText } from "./fields";
import { NOT_LISTED } from "./prepare";
import { getJson } from "@/lib/api-client";

interface BikeItem {
  id: string;
  name: string;
  bikeClass: string;
  typical: boolean;
  travel: { rearWheelMm: number; forkMm: number };
}

async function fetchBikes(q: string): Promise<BikeItem[]> {
  return (await getJson<{ items: BikeItem[] }>(`/api/bikes?q=${encodeURIComponent(q)}`)).items;
}

interface BikePickerProps {
  register: UseFormRegisterReturn;
  selectedId: string;
  selectedName: string;
  onPick: (name: string) => void;
  error?: string;
}

export function BikePicker({ register, selectedId, selectedName, onPick, error }: BikePickerProps) {
  const [q, setQ] = useState("");
  const deferred = useDeferredValue(q.trim());
  const bikes = useQuery({ queryKey: ["bikes", deferred], queryFn: () => fetchBikes(deferred), staleTime: 60_000 });
  const option =
    "flex min-h-12 cursor-pointer items-center gap-3 rounded-lg border border-stone-300 bg-white px-3 py-2 has-[:checked]:border-pine-700 has-[:checked]:bg-pine-50 has-[:focus-visible]:outline has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-pine-600";
  return (
    <fieldset className="flex min-w-0 flex-col gap-2" aria-describedby={error ? "modelId-error" : undefined}>
      <legend className="mb-1 text-sm font-medium text-stone-800">Your bike</legend>
      <label htmlFor="bike-search" className="text-sm text-stone-700">
        Search the shop&apos;s list
      </label>
      <input
        id="bike-search"
        type="search"
        value={q}
        onChange={(e) => setQ(e.target.value)}
        placeholder="e.g. 450, enduro"
        autoComplete="off"
        className="min-h-11 rounded-lg border border-stone-300 bg-white px-3 py-2 text-base"
      />
      {selectedId && selectedId !== NOT_LISTED && selectedName ? (
        <p className="text-sm text-stone-700">
          Chosen: <strong>{selectedName}</strong>
        </p>
      ) : null}
      <div className="flex flex-col gap-2" aria-live="polite" aria-busy={bikes.isFetching}>
        {bikes.isError ? (
          <p className="text-sm text-red-700">The list could not load. Check your signal, or choose “not listed”.</p>
        ) : null}
        {bikes.data?.length === 0 ? <p className="text-sm text-stone-700">No bike matches “{deferred}”.</p> : null}
        {bikes.data?.map((bike) => (
          <label key={bike.id} className={option}>
            <input
              type="radio"
              value={bike.id}
              className="h-5 w-5 shrink-0 accent-pine-700"
              {...register}
              onChange={(e) => {
                void register.onChange(e);
                onPick(bike.name);
              }}
            />
            <span className="min-w-0">
              <span className="block">{bike.name}</span>
              <span className="block text-sm text-stone-600">
                Rear {bike.travel.rearWheelMm} mm · fork {bike.travel.forkMm} mm travel
              </span>
            </span>
          </label>
        ))}
        <label className={option}>
          <input
            type="radio"
            value={NOT_LISTED}
            className="h-5 w-5 shrink-0 accent-pine-700"
            {...register}
            onChange={(e) => {
              void register.onChange(e);
              onPick("");
            }}
          />
          <span>My bike is not listed</span>
        </label>
      </div>
      <ErrorText id="modelId-error" message={error} />
    </fieldset>
  );
}
