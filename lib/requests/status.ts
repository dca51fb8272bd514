// The request statuses and the words for each, shared by the database enum, the queue, the rider's
// status page and e-mails.

export const REQUEST_STATUSES = ["submitted", "in_review", "waiting_for_rider", "approved", "declined"] as const;
export type RequestStatus = (typeof REQUEST_STATUSES)[number];

export const STATUS_LABELS: Record<RequestStatus, string> = {
  submitted: "Submitted",
  in_review: "In review",
  waiting_for_rider: "Waiting for rider",
  approved: "Approved",
  declined: "Declined",
};

/** What happens next, in the rider's words. */
export const STATUS_NEXT_STEP: Record<RequestStatus, string> = {
  submitted: "A tuner will look at your request soon.",
  in_review: "A tuner is working out your setup.",
  waiting_for_rider: "The shop has a question for you: answer it to keep things moving.",
  approved: "Your setup sheet is ready to download.",
  declined: "The shop could not take this request; the reason is below.",
};

/** Badge colours always come with the text label, never alone. */
export const STATUS_BADGE_CLASSES: Record<RequestStatus, string> = {
  submitted: "bg-sky-100 text-sky-900 ring-sky-300",
  in_review: "bg-amber-100 text-amber-900 ring-amber-300",
  waiting_for_rider: "bg-violet-100 text-violet-900 ring-violet-300",
  approved: "bg-emerald-100 text-emerald-900 ring-emerald-300",
  declined: "bg-stone-200 text-stone-800 ring-stone-400",
};
