// One place that turns an error code into a status and a message that is safe to show.
// Codes read `<kind>:<resource>`, e.g. `forbidden:users`, `not_found:case`.

export type ErrorKind =
  | "bad_request"
  | "unauthorized"
  | "forbidden"
  | "not_found"
  | "conflict"
  | "rate_limited"
  | "unsupported_media_type"
  | "payload_too_large"
  | "unavailable";

const STATUS: Record<ErrorKind, number> = {
  bad_request: 400,
  unauthorized: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  payload_too_large: 413,
  unsupported_media_type: 415,
  rate_limited: 429,
  unavailable: 503,
};

const DEFAULT_MESSAGE: Record<ErrorKind, string> = {
  bad_request: "The request could not be read. Check the values and try again.",
  unauthorized: "Sign in to continue.",
  forbidden: "Your role does not allow this.",
  not_found: "Nothing was found here.",
  conflict: "Someone else changed this in the meantime.",
  payload_too_large: "That is too large to accept.",
  unsupported_media_type: "Send the request as JSON.",
  rate_limited: "Too many attempts. Wait a little and try again.",
  unavailable:
    "A service the shop relies on is not answering. Nothing you entered was lost; try again shortly.",
};

export type FieldErrors = Record<string, string[]>;

/**
 * Beside an API error's SI wording: its message and field messages as written, with quantity markers
 * (lib/units/quantity.ts), where any has one, for a screen to say in its reader's units.
 */
export interface MarkedErrorText {
  message?: string;
  fieldErrors?: FieldErrors;
}

export class AppError extends Error {
  readonly kind: ErrorKind;
  readonly resource: string;
  readonly status: number;
  readonly fieldErrors?: FieldErrors;
  readonly headers?: Record<string, string>;
  /** Safe, structured facts about the refusal (e.g. the row a duplicate clashes with). */
  readonly details?: Record<string, unknown>;

  constructor(
    code: `${ErrorKind}:${string}`,
    message?: string,
    extra?: {
      fieldErrors?: FieldErrors;
      headers?: Record<string, string>;
      details?: Record<string, unknown>;
    },
  ) {
    const [kind, resource = ""] = code.split(":") as [ErrorKind, string?];
    super(message ?? DEFAULT_MESSAGE[kind]);
    this.name = "AppError";
    this.kind = kind;
    this.resource = resource;
    this.status = STATUS[kind];
    this.fieldErrors = extra?.fieldErrors;
    this.headers = extra?.headers;
    this.details = extra?.details;
  }

  get code(): string {
    return `${this.kind}:${this.resource}`;
  }

  toJSON() {
    return {
      error: {
        code: this.code,
        message: this.message,
        ...(this.fieldErrors ? { fieldErrors: this.fieldErrors } : {}),
        ...(this.details ? { details: this.details } : {}),
      },
    };
  }
}

export function isAppError(error: unknown): error is AppError {
  return error instanceof AppError;
}
