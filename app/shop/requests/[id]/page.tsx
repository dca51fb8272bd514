import { disciplineLabel, skillLabel } from "@/lib/labels";
import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { AnswersPanel } from "@/components/review/answers-panel";
import { EmailsPanel, MessagesPanel, PhotosPanel, SagReportsPanel } from "@/components/review/activity-panels";
import { AuditTimeline } from "@/components/review/audit-timeline";
import { RideFeedbackPanel } from "@/components/review/ride-feedback-panel";
import { listRideFeedback } from "@/db/queries/ride-feedback";
import { CalibrationNote } from "@/components/review/calibration-note";
import { ServiceHistory } from "@/components/service/service-history";
import { RecommendationEditor } from "@/components/review/recommendation-editor";
import { VersionPicker, sheetLinkFor } from "@/components/review/version-picker";
import { VersionView } from "@/components/review/version-view";
import { ReviewStart } from "@/components/review/review-start";
import { AssignForm, WorkflowActions } from "@/components/review/workflow-actions";
import { StatusBadge } from "@/components/ui/status-badge";
import { getRequestDetail, listStaffMembers } from "@/db/queries/review";
import { listUnseenNoticeKinds } from "@/db/queries/notices";
import { requireRole } from "@/lib/auth/guard";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { formatDay } from "@/lib/format";
import { isUuid } from "@/lib/validations/id";
import { loadServiceHistory } from "@/lib/service/overview";

export const metadata: Metadata = { title: "Request" };
export const dynamic = "force-dynamic";

export default async function RequestPage({
  params,
  searchParams,
}: {
  params: Promise<{ id: string }>;
  searchParams: Promise<{ version?: string }>;
}) {
  const { id } = await params;
  const user = await requireRole(STAFF_ROLES, { page: `/shop/requests/${id}` });
  if (!isUuid(id)) notFound();
  // Opening the page only reads: the review starts with the "Start review" / "Take" action. All of
  // it at once, so a PostgreSQL server answers in one round trip instead of one after another.
  const [detail, unseenKinds, staffMembers, rideFeedback, serviceHistory] = await Promise.all([
    getRequestDetail(id),
    listUnseenNoticeKinds([id]),
    listStaffMembers(),
    listRideFeedback(id),
    loadServiceHistory(id),
  ]);
  if (!detail) notFound();
  const unseen = unseenKinds.get(id) ?? [];
  const staff = staffMembers.map(({ id: sid, name }) => ({ id: sid, name }));
  const { version: asked } = await searchParams;
  const latest = detail.versions.at(-1);
  const shown = detail.versions.find((v) => String(v.version) === asked) ?? latest;
  const editable = shown && latest && shown.version === latest.version && detail.status !== "declined";

  return (
    <div className="flex flex-col gap-6">
      <Link href="/shop" className="inline-flex min-h-11 w-fit items-center text-pine-700 underline">
        ← Back to the queue
      </Link>
      <header className="flex flex-col gap-3 rounded-xl border border-stone-200 bg-white p-4">
        <div className="flex flex-wrap items-center gap-3">
          <h1 className="text-2xl font-bold">
            Request {detail.number}: {detail.riderName}
          </h1>
          <StatusBadge status={detail.status} />
        </div>
        <p className="text-stone-700">
          {detail.bikeLabel} · {disciplineLabel(detail.discipline)}, {skillLabel(detail.skill).toLowerCase()} · received{" "}
          {formatDay(detail.createdAt)}
        </p>
        {shown ? <CalibrationNote output={shown.output} /> : null}
        {detail.status === "declined" && detail.declineReason ? (
          <p className="rounded-lg bg-stone-100 px-3 py-2 text-sm">
            <span className="font-semibold">Declined:</span> {detail.declineReason}
          </p>
        ) : null}
        {detail.status === "waiting_for_rider" ? (
          <p className="rounded-lg bg-violet-50 px-3 py-2 text-sm text-violet-900">
            Waiting for the rider&apos;s answer; it will appear under Questions and answers.
          </p>
        ) : null}
        <ReviewStart
          requestId={id}
          status={detail.status}
          assignedToMe={detail.assignedTunerId === user.id}
          unseen={unseen}
        />
        <div className="flex flex-wrap items-end gap-4">
          <AssignForm requestId={id} current={detail.assignedTunerId} staff={staff} />
          {shown ? (
            <a
              href={sheetLinkFor(id, shown).href}
              target="_blank"
              rel="noreferrer"
              className="inline-flex min-h-11 items-center text-pine-700 underline"
            >
              {sheetLinkFor(id, shown).label}
            </a>
          ) : null}
        </div>
      </header>

      {!shown ? (
        <p role="alert" className="rounded-xl border border-amber-300 bg-amber-50 p-4">
          The engine made no recommendation for this request (for example a bike that is not in the catalog). Ask the
          rider for what is missing, or decline with a reason.
        </p>
      ) : editable ? (
        <RecommendationEditor
          key={shown.version}
          requestId={id}
          input={shown.input}
          rider={{ name: detail.riderName, email: detail.riderEmail, requestNumber: detail.number }}
          latest={{
            version: shown.version,
            state: shown.state,
            overrides: shown.overrides ?? {},
            notesForRider: shown.notesForRider,
            internalNotes: shown.internalNotes,
          }}
        />
      ) : (
        <VersionView
          version={shown.version}
          state={shown.state}
          input={shown.input}
          output={shown.output}
          notesForRider={shown.notesForRider}
          internalNotes={shown.internalNotes}
        />
      )}

      {detail.versions.length > 0 ? (
        <VersionPicker requestId={id} versions={detail.versions} shown={shown?.version ?? 0} />
      ) : null}
      <WorkflowActions requestId={id} status={detail.status} />
      <RideFeedbackPanel requestId={id} rows={rideFeedback} />
      <div className="grid grid-cols-1 gap-6 lg:grid-cols-2">
        <AnswersPanel answers={detail.answers} bikeLabel={detail.bikeLabel} />
        <div className="flex flex-col gap-6">
          <PhotosPanel photos={detail.photos} />
          <MessagesPanel messages={detail.messages} />
          <SagReportsPanel reports={detail.sagReports} />
          <ServiceHistory history={serviceHistory} />
        </div>
        <EmailsPanel emails={detail.emails} />
        <AuditTimeline events={detail.audit} />
      </div>
    </div>
  );
}
