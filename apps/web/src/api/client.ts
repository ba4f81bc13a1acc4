/**
 * The one way the web app talks to the API: JSON in and out, same-origin cookies, and every
 * non-2xx response turned into an ApiError carrying the server's stable error code.
 */

/** Field path (dot-joined, e.g. "name" or "members.0.email") to its first message. */
export type FieldErrors = Readonly<Record<string, string>>;

/** Codes the client itself produces when no server error body is available. */
export type ClientErrorCode = "network-error" | "invalid-response" | "http-error";

export class ApiError extends Error {
  override readonly name = "ApiError";
  readonly code: string;
  readonly status: number;
  readonly details: unknown;
  readonly fieldErrors: FieldErrors;

  constructor(init: { code: string; status: number; message: string; details?: unknown }) {
    super(init.message);
    this.code = init.code;
    this.status = init.status;
    this.details = init.details ?? null;
    this.fieldErrors = extractFieldErrors(init.details);
  }
}

export function isApiError(value: unknown): value is ApiError {
  return value instanceof ApiError;
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === "object" && value !== null && !Array.isArray(value);
}

function joinPath(path: unknown): string | null {
  if (typeof path === "string") return path;
  if (Array.isArray(path) && path.every((p) => typeof p === "string" || typeof p === "number")) {
    return path.join(".");
  }
  return null;
}

function firstMessage(value: unknown): string | null {
  if (typeof value === "string") return value;
  if (Array.isArray(value)) {
    const first: unknown = value.find((v) => typeof v === "string");
    return typeof first === "string" ? first : null;
  }
  return null;
}

/**
 * Field errors arrive in one of the shapes a zod-validating server commonly sends:
 * `{ issues: [{ path, message }] }` (zod issue list), `{ fieldErrors: { name: ["..."] } }`
 * (zod's flatten()), or `{ fields: { name: "..." } }`. Unknown shapes give no field errors,
 * so the form falls back to showing the top-level message.
 */
export function extractFieldErrors(details: unknown): FieldErrors {
  const out: Record<string, string> = {};
  const addIssues = (issues: unknown): void => {
    if (!Array.isArray(issues)) return;
    for (const issue of issues) {
      if (!isRecord(issue)) continue;
      const path = joinPath(issue.path ?? issue.field);
      const message = typeof issue.message === "string" ? issue.message : null;
      if (path !== null && path !== "" && message !== null && !(path in out)) out[path] = message;
    }
  };
  const addRecord = (record: unknown): void => {
    if (!isRecord(record)) return;
    for (const [key, value] of Object.entries(record)) {
      const message = firstMessage(value);
      if (message !== null && !(key in out)) out[key] = message;
    }
  };

  if (Array.isArray(details)) addIssues(details);
  if (isRecord(details)) {
    addIssues(details.issues);
    addRecord(details.fieldErrors);
    addRecord(details.fields);
  }
  return out;
}

/** Turns a failed response body into an ApiError; never throws. */
export function parseErrorBody(status: number, body: unknown, statusText = ""): ApiError {
  const error = isRecord(body) ? body.error : undefined;
  if (isRecord(error) && typeof error.code === "string") {
    return new ApiError({
      code: error.code,
      status,
      message: typeof error.message === "string" && error.message !== "" ? error.message : error.code,
      details: error.details,
    });
  }
  return new ApiError({
    code: "http-error",
    status,
    message: `The server answered ${status}${statusText ? ` ${statusText}` : ""}.`,
    details: body ?? null,
  });
}

export type RequestMethod = "GET" | "POST" | "PATCH" | "PUT" | "DELETE";

export interface RequestOptions {
  method?: RequestMethod;
  body?: unknown;
  signal?: AbortSignal;
  /**
   * Validates and narrows the JSON body; a mismatch becomes an "invalid-response" ApiError. May be
   * async (the contracts' schemas load as their own chunk: see schemas.ts).
   */
  parse?: (data: unknown) => unknown;
}

type Fetch = typeof fetch;

async function readJson(response: Response): Promise<unknown> {
  const text = await response.text();
  if (text === "") return null;
  try {
    return JSON.parse(text) as unknown;
  } catch {
    return text;
  }
}

/** Sends one request; resolves with the parsed JSON (null for 204), rejects with ApiError. */
export async function request<T>(
  path: string,
  options: RequestOptions & { parse: (data: unknown) => T | PromiseLike<T> },
  fetchImpl?: Fetch,
): Promise<T>;
export async function request(path: string, options?: RequestOptions, fetchImpl?: Fetch): Promise<unknown>;
export async function request(
  path: string,
  options: RequestOptions = {},
  fetchImpl: Fetch = (input, init) => fetch(input, init),
): Promise<unknown> {
  const early = (options.method ?? "GET") === "GET" ? takeEarly(path) : null;
  const { status, data } = await (early ?? send(path, options, fetchImpl));
  if (options.parse === undefined) return data;
  try {
    return await options.parse(data);
  } catch (cause) {
    throw new ApiError({
      code: "invalid-response",
      status,
      message: "The server sent a response this version of the app does not understand.",
      details: cause instanceof Error ? cause.message : null,
    });
  }
}

/**
 * GETs started by startEarly.ts before the app itself has loaded: the first request() for the same
 * path takes the answer instead of asking again. Only for a few seconds, so that a page opened
 * later never gets an old answer.
 */
const early = new Map<string, { at: number; answer: Promise<Answer> }>();
const EARLY_TTL_MS = 10_000;

/**
 * Starts a GET of `path` now, for the app's first request of it. Returns the JSON body too (an
 * ApiError rejects it), for a caller that wants to act on it before the app does.
 */
export function requestEarly(path: string): Promise<unknown> {
  const answer = send(path, {}, (input, init) => fetch(input, init));
  early.set(path, { at: Date.now(), answer });
  const data = answer.then((a) => a.data);
  // the taker (or the caller) sees an error; either may not be there
  answer.catch(() => {});
  data.catch(() => {});
  return data;
}

function takeEarly(path: string): Promise<Answer> | null {
  const started = early.get(path);
  if (!started) return null;
  early.delete(path);
  return Date.now() - started.at <= EARLY_TTL_MS ? started.answer : null;
}

interface Answer {
  readonly status: number;
  readonly data: unknown;
}

/** One HTTP exchange: the status and JSON body (null for 204) of a 2xx answer, else an ApiError. */
async function send(path: string, options: RequestOptions, fetchImpl: Fetch): Promise<Answer> {
  const headers: Record<string, string> = { Accept: "application/json" };
  const init: RequestInit = {
    method: options.method ?? "GET",
    credentials: "same-origin",
    headers,
    signal: options.signal ?? null,
  };
  if (options.body !== undefined) {
    headers["Content-Type"] = "application/json";
    init.body = JSON.stringify(options.body);
  }

  let response: Response;
  try {
    response = await fetchImpl(path, init);
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === "AbortError") throw cause;
    throw new ApiError({
      code: "network-error",
      status: 0,
      message: "Could not reach the Spanwright server. Check your connection and try again.",
    });
  }

  const data = await readJson(response);
  if (!response.ok) throw parseErrorBody(response.status, data, response.statusText);
  return { status: response.status, data };
}

/** A short human sentence for any error a query or mutation can reject with. */
export function describeError(error: unknown): string {
  if (isApiError(error)) return error.message;
  if (error instanceof Error) return error.message;
  return "Something went wrong.";
}
