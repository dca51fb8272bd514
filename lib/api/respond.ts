// Route handlers answer errors in one shape: `{ error, fields? }` with 400/401/403/404/409/413/415/429.
// This is the one place where a domain error (lib/errors.ts) becomes an HTTP status. Details of
// unexpected failures go to the server log, never to the client.
import { NextResponse } from "next/server";
import { ZodError } from "zod";
import { AuthError } from "@/lib/auth/guard";
import {
  ConflictError,
  DomainError,
  fieldMessages,
  ForbiddenError,
  NotFoundError,
  TooLargeError,
  ValidationError,
} from "@/lib/errors";

/** An answer about the HTTP exchange itself (wrong content type, rate limit), not about the shop's data. */
export class HttpError extends Error {
  constructor(
    readonly status: 400 | 404 | 409 | 413 | 415 | 422 | 429,
    message: string,
    readonly fields?: Record<string, string>,
    readonly headers?: Record<string, string>,
  ) {
    super(message);
    this.name = "HttpError";
  }
}

/** `{ "rider.massKg": "Must be at least 20" }` from a zod error, first message per field. */
export function fieldErrors(error: ZodError): Record<string, string> {
  return fieldMessages(error.issues);
}

function domainStatus(error: DomainError): number {
  if (error instanceof ValidationError) return 400;
  if (error instanceof ForbiddenError) return 403;
  if (error instanceof NotFoundError) return 404;
  if (error instanceof ConflictError) return 409;
  if (error instanceof TooLargeError) return 413;
  return 400;
}

const json = (message: string, status: number, fields?: Record<string, string>, headers?: Record<string, string>) =>
  NextResponse.json({ error: message, ...(fields ? { fields } : {}) }, { status, headers });

export function errorResponse(error: unknown): NextResponse {
  if (error instanceof AuthError) return json(error.message, error.status);
  if (error instanceof ZodError) return json("Some fields need attention.", 400, fieldErrors(error));
  if (error instanceof DomainError) return json(error.message, domainStatus(error), error.fields);
  if (error instanceof HttpError) return json(error.message, error.status, error.fields, error.headers);
  console.error("[api] unexpected error", error);
  return json("Something went wrong on our side.", 500);
}

type Handler<C> = (request: Request, context: C) => Promise<Response>;

/** Wraps a route handler so thrown guard, validation, domain and HTTP errors become JSON answers. */
export function withErrors<C>(handler: Handler<C>): Handler<C> {
  return async (request, context) => {
    try {
      return await handler(request, context);
    } catch (error) {
      return errorResponse(error);
    }
  };
}
