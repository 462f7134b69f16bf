import type { FieldErrors, MarkedErrorText } from "@/lib/errors";
import { retryAfterMs } from "./retry-after";

export class ApiError extends Error {
  constructor(
    message: string,
    readonly status: number,
    readonly code: string,
    readonly fieldErrors?: FieldErrors,
    /** How long the server asked us to wait (its Retry-After header), when it said. */
    readonly retryAfterMs?: number,
    /** The wording with quantity markers, where the server's SI sentence had some: say it in the reader's units. */
    readonly marked?: MarkedErrorText,
  ) {
    super(message);
    this.name = "ApiError";
  }
}

/** JSON in, JSON out; a non-2xx answer becomes an ApiError carrying the server's safe message. */
export async function apiFetch<T = unknown>(
  url: string,
  init: { method?: string; body?: unknown; signal?: AbortSignal } = {},
): Promise<T> {
  const response = await fetch(url, {
    method: init.method ?? "GET",
    headers: init.body === undefined ? undefined : { "content-type": "application/json" },
    body: init.body === undefined ? undefined : JSON.stringify(init.body),
    signal: init.signal,
    credentials: "same-origin",
  });
  const data = (await response.json().catch(() => null)) as
    | (T & { error?: { code: string; message: string; fieldErrors?: FieldErrors; marked?: MarkedErrorText } })
    | null;
  if (!response.ok) {
    throw new ApiError(
      data?.error?.message ?? `The server answered ${response.status}.`,
      response.status,
      data?.error?.code ?? "unknown",
      data?.error?.fieldErrors,
      retryAfterMs(response.headers.get("retry-after")),
      data?.error?.marked,
    );
  }
  return data as T;
}

/**
 * An API error's first message per field and its message. With `say` (sayInUnits in the reader's
 * units), a message the server also sent with quantity markers is said in the reader's units.
 */
export function apiErrorText(
  error: ApiError,
  say?: (marked: string) => string,
): { fieldErrors: Record<string, string>; message: string } {
  const fieldErrors = Object.fromEntries(
    Object.entries(error.fieldErrors ?? {}).map(([field, messages]) => {
      const marked = say && error.marked?.fieldErrors?.[field]?.[0];
      return [field, marked ? say(marked) : (messages[0] ?? "")];
    }),
  );
  const message = say && error.marked?.message !== undefined ? say(error.marked.message) : error.message;
  return { fieldErrors, message };
}

/** A failed save as a form shows it: apiErrorText, and a line saying nothing typed was lost. */
export function saveErrorOf(
  error: unknown,
  say?: (marked: string) => string,
): { fieldErrors: Record<string, string>; message: string } {
  if (error instanceof ApiError) {
    const { fieldErrors, message } = apiErrorText(error, say);
    return { fieldErrors, message: `${message} What you typed is kept.` };
  }
  return { fieldErrors: {}, message: "No answer from the server; what you typed is kept." };
}
