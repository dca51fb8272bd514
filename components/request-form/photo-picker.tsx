"use client";

// Up to 6 photos (JPEG, PNG or WebP, 10 MB each). The server checks each file's content again;
// here the rider gets an early, plain message. Files cannot be kept in the browser's draft.
import { useState } from "react";
import { MAX_PHOTOS, MAX_PHOTO_BYTES } from "@/lib/storage/limits";

const ACCEPT = ["image/jpeg", "image/png", "image/webp"];

export function PhotoPicker({
  files,
  onChange,
  serverError,
}: {
  files: File[];
  onChange: (files: File[]) => void;
  serverError?: string;
}) {
  const [problem, setProblem] = useState<string | null>(null);
  const add = (list: FileList | null) => {
    if (!list) return;
    const next = [...files];
    for (const file of Array.from(list)) {
      if (next.length >= MAX_PHOTOS) {
        setProblem(`At most ${MAX_PHOTOS} photos.`);
        break;
      }
      if (/\.hei[cf]$/i.test(file.name) || file.type === "image/heic" || file.type === "image/heif") {
        setProblem(
          `“${file.name}” is a HEIC photo, which the shop cannot open. Send it as JPEG (most phones can share or export it as JPEG).`,
        );
        continue;
      }
      if (!ACCEPT.includes(file.type)) {
        setProblem(`“${file.name}” is not a JPEG, PNG or WebP photo.`);
        continue;
      }
      if (file.size > MAX_PHOTO_BYTES) {
        setProblem(`“${file.name}” is ${(file.size / 1048576).toFixed(1)} MB; each photo may be at most 10 MB.`);
        continue;
      }
      next.push(file);
    }
    onChange(next);
  };
  const message = problem ?? serverError;
  return (
    <div className="flex flex-col gap-2">
      <label htmlFor="photos" className="text-sm font-medium text-stone-800">
        Photos of the bike or suspension (optional, up to {MAX_PHOTOS})
      </label>
      <p id="photos-hint" className="text-sm text-stone-600">
        JPEG, PNG or WebP, up to 10 MB each. Photos are not kept in your draft: if you close this page before sending,
        add them again.
      </p>
      <input
        id="photos"
        type="file"
        accept={ACCEPT.join(",")}
        multiple
        aria-describedby={message ? "photos-hint photos-error" : "photos-hint"}
        className="min-h-11 w-full max-w-full text-base file:mr-3 file:min-h-11 file:rounded-lg file:border-0 file:bg-pine-700 file:px-4 file:font-semibold file:text-white"
        onChange={(e) => {
          setProblem(null);
          add(e.target.files);
          e.target.value = "";
        }}
      />
      {message ? (
        <p id="photos-error" role="alert" className="text-sm font-medium text-red-700">
          {message}
        </p>
      ) : null}
      {files.length ? (
        <ul className="flex flex-col gap-2">
          {files.map((file, i) => (
            <li
              key={`${file.name}-${i}`}
              className="flex items-center justify-between gap-2 rounded-lg border border-stone-200 bg-white px-3 py-1"
            >
              <span className="min-w-0 truncate">{file.name}</span>
              <button
                type="button"
                className="min-h-11 shrink-0 rounded-lg px-3 font-semibold text-pine-700 hover:bg-pine-50"
                onClick={() => onChange(files.filter((_, j) => j !== i))}
              >
                Remove<span className="sr-only"> {file.name}</span>
              </button>
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
