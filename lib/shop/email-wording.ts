// The owner's wording of the rider e-mails: saved per template (audited) and previewed exactly as
// the e-mail is built for sending, with the shop's name and invented demo data for the rest.
import { findEmailWording, listEmailWording, saveEmailWording } from "@/db/queries/email-wording";
import { recordAudit } from "@/db/queries/audit";
import { getShopName } from "@/db/queries/settings";
import { emailTemplates } from "@/emails";
import type { SessionUser } from "@/lib/auth/guard";
import { renderTemplate } from "@/lib/mail";
import { RIDER_EMAIL_TEMPLATES } from "@/lib/validations/email-wording";
import type { z } from "zod";
import type { emailWordingSchema } from "@/lib/validations/email-wording";

type Wording = z.output<typeof emailWordingSchema>;

export async function previewRiderEmail(wording: Wording) {
  const shopName = await getShopName();
  const demo = emailTemplates[wording.template].demoProps;
  return renderTemplate(wording.template, {
    ...demo,
    shopName,
    wording: { heading: wording.heading, intro: wording.intro },
  } as never);
}

export async function saveRiderEmailWording(user: SessionUser, wording: Wording) {
  const before = await findEmailWording(wording.template);
  const row = await saveEmailWording(wording.template, { heading: wording.heading, intro: wording.intro }, user.name);
  await recordAudit({
    actorUserId: user.id,
    actorLabel: user.name,
    action: "email-wording.saved",
    detail: { template: wording.template, before, after: { heading: row.heading, intro: row.intro } },
  });
  return row;
}

/** Every rider template with the shop's wording (null where the template's own words apply). */
export async function listRiderEmailWording() {
  const rows = new Map((await listEmailWording()).map((r) => [r.template, r]));
  return RIDER_EMAIL_TEMPLATES.map((template) => ({
    template,
    description: emailTemplates[template].description,
    heading: rows.get(template)?.heading ?? null,
    intro: rows.get(template)?.intro ?? null,
  }));
}
