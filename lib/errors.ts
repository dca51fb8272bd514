// Domain errors: what went wrong in the shop's terms. Services and guards throw them; `withErrors`
// (lib/api/respond.ts) is the one place that turns them into HTTP answers `{ error, fields? }`.
// `fields` maps a field path ("rider.massKg") to a message shown beside that input.

export type FieldMessages = Record<string, string>;

export abstract class DomainError extends Error {
  constructor(
    message: string,
    readonly fields?: FieldMessages,
  ) {
    super(message);
    this.name = new.target.name;
  }
}

/** The input cannot be used; `fields` says which field and why (400). */
export class ValidationError extends DomainError {}

/** The thing named does not exist, or is not the caller's to see (404). */
export class NotFoundError extends DomainError {}

/** The action does not fit the current state: already done, changed meanwhile, a duplicate (409). */
export class ConflictError extends DomainError {}

/** The caller is known but may not do this (403). */
export class ForbiddenError extends DomainError {}

/** The upload is larger than the shop accepts (413). */
export class TooLargeError extends DomainError {}

/** `{ "rider.massKg": "Must be at least 20" }` from zod-style issues, the first message per field. */
export function fieldMessages(issues: readonly { path: readonly PropertyKey[]; message: string }[]): FieldMessages {
  const fields: FieldMessages = {};
  for (const issue of issues) {
    const key = issue.path.map(String).join(".") || "_";
    fields[key] ??= issue.message;
  }
  return fields;
}
