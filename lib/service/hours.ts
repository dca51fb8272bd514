// The rider logs hours ridden (a number and a day): the service dates move with them.
import { insertHourLog } from "@/db/queries/service";
import { ConflictError, ValidationError } from "@/lib/errors";
import type { HourLog } from "@/lib/validations/service";
import { formatDay } from "@/lib/format";
import { addDays } from "./civil-date";
import { loadServiceOverview, type ServiceOverview } from "./overview";

export async function logRiderHours(requestId: string, log: HourLog, now = new Date()): Promise<ServiceOverview> {
  const before = await loadServiceOverview(requestId, now);
  if (!before)
    throw new ConflictError("Service dates start once the shop has approved your setup sheet: log hours after that.");
  // A rider a time zone ahead of the shop may already be on tomorrow's date.
  if (log.date > addDays(before.today, 1))
    throw new ValidationError("That day has not come yet.", { date: "Pick a day you have already ridden" });
  if (log.date < before.startedOn)
    throw new ValidationError("That day is before your current setup.", {
      date: `Pick a day from ${formatDay(`${before.startedOn}T00:00:00Z`)} on: hours before your setup count toward the previous service`,
    });
  await insertHourLog({ requestId, hours: log.hours, riddenOn: log.date });
  return (await loadServiceOverview(requestId, now))!;
}
