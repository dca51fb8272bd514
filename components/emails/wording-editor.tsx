"use client";

import { Form } from "@/components/ui/form";

// One rider e-mail's wording: heading and opening paragraph in the shop's own words, previewed as
// the e-mail would be sent (nothing saved until "Save"), and saved for every later e-mail.
import { useState } from "react";
import { Field } from "@/components/ui/field";
import { Button } from "@/components/ui/button";
import { FormAlert } from "@/components/ui/form-alert";
import { callApi } from "@/lib/api-client";

export interface WordingRow {
  template: string;
  description: string;
  heading: string | null;
  intro: string | null;
}

export function WordingEditor({ row }: { row: WordingRow }) {
  const [heading, setHeading] = useState(row.heading ?? "");
  const [intro, setIntro] = useState(row.intro ?? "");
  const [fields, setFields] = useState<Record<string, string>>({});
  const [problem, setProblem] = useState<string | null>(null);
  const [saved, setSaved] = useState<string | null>(null);
  const [preview, setPreview] = useState<{ subject: string; html: string } | null>(null);
  const id = (name: string) => `${row.template}-${name}`;
  const body = { template: row.template, heading, intro };

  const answered = (result: { ok: false; error: string; fields: Record<string, string> }) => {
    setFields(result.fields);
    setProblem(result.error);
  };

  return (
    <Form
      aria-labelledby={id("title")}
      className="flex flex-col gap-3 rounded-xl border border-stone-200 bg-white p-4"
      onSubmit={async (e) => {
        e.preventDefault();
        setSaved(null);
        const result = await callApi("/api/shop/emails/wording", "PUT", body, {
          offline: "No connection: your wording is still in the form. Save again when you are back online.",
          fallback: "The wording could not be saved.",
        });
        if (!result.ok) return answered(result);
        setFields({});
        setProblem(null);
        setSaved("Saved: the next e-mails of this kind use this wording.");
      }}
    >
      <h2 id={id("title")} className="text-lg font-semibold">
        {row.description}
      </h2>
      <Field
        id={id("heading")}
        label="Heading"
        hint="Empty: the e-mail's own heading"
        value={heading}
        error={fields.heading}
        onChange={(e) => setHeading(e.target.value)}
      />
      <div className="flex flex-col gap-1">
        <label htmlFor={id("intro")} className="text-sm font-medium text-stone-800">
          Opening paragraph
        </label>
        <textarea
          id={id("intro")}
          rows={4}
          value={intro}
          aria-invalid={fields.intro ? true : undefined}
          aria-describedby={`${id("intro")}-hint${fields.intro ? ` ${id("intro")}-error` : ""}`}
          onChange={(e) => setIntro(e.target.value)}
          className="rounded-lg border border-stone-300 bg-white px-3 py-2 text-base aria-[invalid=true]:border-red-600"
        />
        <p id={`${id("intro")}-hint`} className="text-xs text-stone-600">
          Empty: the e-mail&apos;s own words. {"{rider}"}, {"{request}"} and {"{shop}"} are filled in.
        </p>
        {fields.intro ? (
          <p id={`${id("intro")}-error`} className="text-sm font-medium text-red-700">
            {fields.intro}
          </p>
        ) : null}
      </div>
      <FormAlert message={problem} />
      {saved ? (
        <p role="status" className="text-sm text-emerald-800">
          {saved}
        </p>
      ) : null}
      <div className="flex flex-wrap gap-2">
        <Button
          type="button"
          variant="ghost"
          onClick={async () => {
            const result = await callApi<{ subject: string; html: string }>("/api/shop/emails/preview", "POST", body, {
              offline: "No connection: the preview needs the server.",
              fallback: "The preview could not be built.",
            });
            if (!result.ok) return answered(result);
            setFields({});
            setProblem(null);
            setPreview(result.data);
          }}
        >
          Preview
        </Button>
        <Button type="submit">Save</Button>
      </div>
      {preview ? (
        <div className="flex flex-col gap-2">
          <p>
            <span className="font-medium">Subject:</span> {preview.subject}
          </p>
          <iframe
            title={`${row.description}: preview with this wording`}
            srcDoc={preview.html}
            sandbox=""
            className="h-[28rem] w-full max-w-[22rem] rounded-lg border border-stone-200 bg-white"
          />
        </div>
      ) : null}
    </Form>
  );
}
