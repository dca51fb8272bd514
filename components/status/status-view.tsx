// The rider's private view of one request: where it stands and what happens next, the shop's
// question, the approved sheets, the sag follow-up, the photos and the answers as given.
import { RiderOrders } from "@/components/orders/rider-orders";
import { SagGuide } from "@/components/sag-guide/sag-guide";
import { StatusBadge } from "@/components/ui/status-badge";
import type { RiderStatus } from "@/db/queries/status";
import { STATUS_NEXT_STEP } from "@/lib/requests/status";
import { sheetPath } from "@/lib/requests/token";
import { ServiceDuePanel } from "@/components/service/service-due-panel";
import type { ServiceOverview } from "@/lib/service/types";
import { AnswerForm } from "./answer-form";
import { AnswersList } from "./answers-list";
import { SafetyCaution } from "./safety-caution";
import { RideFeedbackForm } from "./ride-feedback-form";
import { SagFollowUp } from "./sag-follow-up";
import { formatDay } from "@/lib/format";

const box = "flex flex-col gap-3 rounded-xl border border-stone-200 bg-white p-4";

export function StatusView({
  data,
  token,
  justSent,
  service,
}: {
  data: RiderStatus;
  token?: string;
  justSent?: boolean;
  service?: ServiceOverview | null;
}) {
  const { request, versions, messages, photos, reports } = data;
  const withToken = (path: string) =>
    token ? `${path}${path.includes("?") ? "&" : "?"}token=${encodeURIComponent(token)}` : path;
  const answers = request.answers;
  const metric = answers.rider?.weight?.unit !== "lb";
  const lastQuestion = [...messages].reverse().find((m) => m.author === "tuner");
  return (
    <div className="flex flex-col gap-6">
      {justSent ? (
        <p role="status" className="rounded-lg bg-emerald-50 p-3 text-emerald-900">
          Request sent. We e-mailed you a link to this page: keep it to come back.
        </p>
      ) : null}
      <header className="flex flex-col gap-2">
        <h1 className="text-2xl font-bold">Request {request.number}</h1>
        <p className="text-stone-700">
          {request.bikeLabel} · sent {formatDay(request.createdAt)}
        </p>
        <div className="flex flex-wrap items-center gap-2">
          <StatusBadge status={request.status} />
          <span>{STATUS_NEXT_STEP[request.status]}</span>
        </div>
      </header>

      {request.status === "declined" && request.declineReason ? (
        <section className={box} aria-labelledby="decline-heading">
          <h2 id="decline-heading" className="text-lg font-semibold">
            Why the shop declined
          </h2>
          <p className="whitespace-pre-line">{request.declineReason}</p>
        </section>
      ) : null}

      {messages.length ? (
        <section className={box} aria-labelledby="messages-heading">
          <h2 id="messages-heading" className="text-lg font-semibold">
            {request.status === "waiting_for_rider" ? "The shop has a question" : "Questions and answers"}
          </h2>
          <ul className="flex flex-col gap-2">
            {messages.map((m) => (
              <li key={m.id} className={`rounded-lg p-3 ${m.author === "tuner" ? "bg-violet-50" : "bg-stone-100"}`}>
                <p className="text-sm font-semibold">
                  {m.author === "tuner" ? "Shop" : "You"} · {formatDay(m.createdAt)}
                </p>
                <p className="whitespace-pre-line">{m.body}</p>
              </li>
            ))}
          </ul>
          {request.status === "waiting_for_rider" && lastQuestion ? (
            <AnswerForm requestId={request.id} token={token} />
          ) : null}
        </section>
      ) : null}

      {versions.length ? (
        <section className={box} aria-labelledby="sheets-heading">
          <h2 id="sheets-heading" className="text-lg font-semibold">
            Your setup sheet
          </h2>
          <ul className="flex flex-col gap-2">
            {versions.map((v, i) => (
              <li key={v.id} className="flex flex-col gap-1">
                <a
                  href={sheetPath(request.id, v.version, token)}
                  className="inline-flex min-h-11 items-center font-semibold text-pine-700 underline"
                >
                  Download setup sheet, version {v.version} (PDF)
                </a>
                <span className="text-sm text-stone-600">
                  Approved {v.approvedAt ? formatDay(v.approvedAt) : ""}
                  {i === 0 ? " · current" : " · replaced by a newer version"}
                </span>
                {i === 0 && v.notesForRider ? <p className="rounded-lg bg-pine-50 p-3">{v.notesForRider}</p> : null}
              </li>
            ))}
          </ul>
        </section>
      ) : null}

      <RiderOrders requestId={request.id} token={token} canOrder={request.status === "approved"} />
      {request.status === "approved" ? (
        <section className={box} aria-labelledby="sag-heading">
          <h2 id="sag-heading" className="text-lg font-semibold">
            Report your sag
          </h2>
          <p className="text-stone-700">
            After fitting the springs, measure sag and enter it here: you get an answer at once, and the tuner sees it
            too.
          </p>
          <SafetyCaution />
          <SagGuide />
          <SagFollowUp requestId={request.id} token={token} metric={metric} reports={reports} />
        </section>
      ) : null}

      {request.status === "approved" ? (
        <section className={box} aria-labelledby="ride-heading">
          <h2 id="ride-heading" className="text-lg font-semibold">
            After the first rides: how does it ride now?
          </h2>
          <p className="text-stone-700">
            Tick what you feel at each end, or tell us in your words. We suggest the next clicker step from the setup
            you run now, and your tuner sends a revised sheet.
          </p>
          <RideFeedbackForm requestId={request.id} token={token} />
        </section>
      ) : null}

      {service ? <ServiceDuePanel requestId={request.id} token={token} overview={service} /> : null}

      {photos.length ? (
        <section className={box} aria-labelledby="photos-heading">
          <h2 id="photos-heading" className="text-lg font-semibold">
            Your photos
          </h2>
          <ul className="grid grid-cols-2 gap-2 sm:grid-cols-3">
            {photos.map((p, i) => (
              <li key={p.id}>
                <a href={withToken(`/api/uploads/${p.id}`)} className="block rounded-lg border border-stone-200 p-1">
                  {/* Served by our own guarded route; next/image would cache it outside the guard. */}
                  {/* eslint-disable-next-line @next/next/no-img-element */}
                  <img
                    src={withToken(`/api/uploads/${p.id}`)}
                    alt={`Photo ${i + 1}: ${p.originalName}`}
                    className="aspect-square w-full rounded object-cover"
                  />
                </a>
              </li>
            ))}
          </ul>
        </section>
      ) : null}

      <section className="flex flex-col gap-3" aria-labelledby="answers-heading">
        <h2 id="answers-heading" className="text-lg font-semibold">
          Your answers
        </h2>
        <AnswersList answers={request.answers} bikeLabel={request.bikeLabel} />
      </section>
    </div>
  );
}
