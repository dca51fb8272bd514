// The rider answers the tuner's question: the answer, the request back in review and the shop's
// notice (lib/notify-staff.ts) commit together; the e-mail leaves after the commit.
import { recordRiderAnswer } from "@/db/queries/status";
import { kickOutbox } from "@/lib/mail";
import { notifyStaff } from "@/lib/notify-staff";

export async function answerShopQuestion(requestId: string, body: string): Promise<void> {
  await recordRiderAnswer(requestId, body, (tx) => notifyStaff(tx, { kind: "rider-answered", requestId }));
  kickOutbox();
}
