import type { FieldErrors } from "@/lib/errors";
import { retryAfterMs } from "./retry-after";

export class ApiError extends Error {
  constructor(
    message: string,
    readonly status: number,
    readonly code: string,
    readonly fieldErrors?: FieldErrors,
    /** How long the server asked us to wait (its Retry-After header), when it said. */
    readonly retryAfterMs?: number,
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
    (T & { error?: { code: string; message: string; fieldErrors?: FieldErrors } }) | null;
  if (!response.ok) {
    throw new ApiError(
      data?.error?.message ?? `The server answered ${response.status}.`,
      response.status,
      data?.error?.code ?? "unknown",
      data?.error?.fieldErrors,
      retryAfterMs(response.headers.get("retry-after")),
    );
  }
  return data as T;
}

/** A failed save as a form shows it: the first message per field, and a line saying nothing typed was lost. */
export function saveErrorOf(error: unknown): { fieldErrors: Record<string, string>; message: string } {
  if (error instanceof ApiError) {
    const fieldErrors = Object.fromEntries(
      Object.entries(error.fieldErrors ?? {}).map(([field, messages]) => [field, messages[0] ?? ""]),
    );
    return { fieldErrors, message: `${error.message} What you typed is kept.` };
  }
  return { fieldErrors: {}, message: "No answer from the server; what you typed is kept." };
}
