/**
 * The one fetch wrapper for the Eavesight API. Every call sends the session cookie, speaks JSON and
 * rejects on anything but 2xx with an {@link ApiError} parsed from `{ error: { code, message, fields } }`.
 */

export type ApiFieldErrors = Record<string, string>;

export class ApiError extends Error {
  override readonly name = "ApiError";
  /** HTTP status; 0 when the server could not be reached at all. */
  readonly status: number;
  /** Machine-readable code from the server, e.g. "invalid-credentials", "rate-limited". */
  readonly code: string;
  /** Per-field messages keyed by the request body's field names. */
  readonly fields: ApiFieldErrors;

  constructor(status: number, code: string, message: string, fields: ApiFieldErrors = {}) {
    super(message);
    this.status = status;
    this.code = code;
    this.fields = fields;
  }

  get isNetworkError(): boolean {
    return this.status === 0;
  }
}

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError;
}

type Json = Record<string, unknown> | unknown[];

export interface RequestOptions {
  body?: Json;
  signal?: AbortSignal;
  headers?: Record<string, string>;
}

const API_BASE = "/api";

const FALLBACK_MESSAGES: Record<number, string> = {
  400: "Some of the details aren't right. Check the form and try again.",
  401: "Please sign in to continue.",
  403: "Your role doesn't allow this.",
  404: "We couldn't find that. It may have been removed.",
  409: "Someone else changed this at the same time. Reload and try again.",
  410: "This link has expired.",
  413: "That's too large to upload.",
  429: "Too many attempts. Please wait a few minutes and try again.",
};

function fallbackMessage(status: number): string {
  return FALLBACK_MESSAGES[status] ?? "Something went wrong on our side. Please try again in a moment.";
}

/** Accepts `fields` as a record of strings, a record of string arrays, or a list of `{ path, message }`. */
function normalizeFields(raw: unknown): ApiFieldErrors {
  const fields: ApiFieldErrors = {};
  if (Array.isArray(raw)) {
    for (const item of raw) {
      if (item && typeof item === "object") {
        const { path, field, message } = item as { path?: unknown; field?: unknown; message?: unknown };
        const key = Array.isArray(path) ? path.join(".") : typeof path === "string" ? path : field;
        if (typeof key === "string" && typeof message === "string") fields[key] ??= message;
      }
    }
  } else if (raw && typeof raw === "object") {
    for (const [key, value] of Object.entries(raw)) {
      if (typeof value === "string") fields[key] = value;
      else if (Array.isArray(value) && typeof value[0] === "string") fields[key] = value[0];
    }
  }
  return fields;
}

async function toApiError(response: Response): Promise<ApiError> {
  let payload: unknown = null;
  try {
    payload = await response.json();
  } catch {
    // Not JSON (a proxy page, an empty body): fall back to a plain message for the status.
  }
  const error = (payload as { error?: { code?: unknown; message?: unknown; fields?: unknown } } | null)?.error;
  const code = typeof error?.code === "string" ? error.code : `http-${response.status}`;
  const message =
    typeof error?.message === "string" && error.message.trim() !== ""
      ? error.message
      : fallbackMessage(response.status);
  return new ApiError(response.status, code, message, normalizeFields(error?.fields));
}

async function request<T>(method: string, path: string, options: RequestOptions = {}): Promise<T> {
  const headers: Record<string, string> = { accept: "application/json", ...options.headers };
  let body: string | undefined;
  if (options.body !== undefined) {
    headers["content-type"] = "application/json";
    body = JSON.stringify(options.body);
  }

  let response: Response;
  try {
    response = await fetch(`${API_BASE}${path}`, {
      method,
      headers,
      body,
      credentials: "same-origin",
      signal: options.signal,
    });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === "AbortError") throw cause;
    throw new ApiError(0, "network", "Can't reach Eavesight. Check your connection and try again.");
  }

  if (!response.ok) throw await toApiError(response);
  if (response.status === 204 || response.status === 205) return undefined as T;

  const text = await response.text();
  return (text === "" ? undefined : JSON.parse(text)) as T;
}

/** Waits before the 2nd and 3rd try of a creating request. */
const CREATE_RETRY_DELAYS_MS = [1_000, 2_000];
const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/**
 * A creating POST (one form submission): it carries one Idempotency-Key, and when the answer is
 * unsure (503 while the database is away, or no answer at all) it is sent again with the same key,
 * so the server hands back the first result instead of creating a second row.
 */
async function create<T>(path: string, body: Json, options: Omit<RequestOptions, "body"> = {}): Promise<T> {
  const key = crypto.randomUUID();
  const headers = { ...options.headers, "idempotency-key": key };
  for (let attempt = 0; ; attempt++) {
    try {
      return await request<T>("POST", path, { ...options, headers, body });
    } catch (error) {
      const unsure = isApiError(error) && (error.status === 503 || error.isNetworkError);
      const delayMs = CREATE_RETRY_DELAYS_MS[attempt];
      if (!unsure || delayMs === undefined || options.signal?.aborted) throw error;
      await sleep(delayMs);
    }
  }
}

export const apiClient = {
  create,
  get: <T>(path: string, options?: Omit<RequestOptions, "body">) => request<T>("GET", path, options),
  post: <T>(path: string, body?: Json, options?: Omit<RequestOptions, "body">) =>
    request<T>("POST", path, { ...options, body }),
  patch: <T>(path: string, body?: Json, options?: Omit<RequestOptions, "body">) =>
    request<T>("PATCH", path, { ...options, body }),
  put: <T>(path: string, body?: Json, options?: Omit<RequestOptions, "body">) =>
    request<T>("PUT", path, { ...options, body }),
  delete: <T = void>(path: string, options?: Omit<RequestOptions, "body">) => request<T>("DELETE", path, options),
};
