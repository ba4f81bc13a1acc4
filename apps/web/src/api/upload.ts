import { ApiError, parseErrorBody } from "./client";

/**
 * Multipart uploads (one file plus text fields). Kept apart from `request` because the browser must
 * set the multipart boundary itself, so no Content-Type header may be given here.
 */
export async function uploadFile<T>(
  path: string,
  input: { file: Blob; fileName?: string; fields?: Record<string, string> },
  parse: (data: unknown) => T,
  fetchImpl: typeof fetch = (url, init) => fetch(url, init),
): Promise<T> {
  const form = new FormData();
  for (const [key, value] of Object.entries(input.fields ?? {})) form.append(key, value);
  form.append("file", input.file, input.fileName ?? (input.file instanceof File ? input.file.name : "upload"));

  let response: Response;
  try {
    response = await fetchImpl(path, {
      method: "POST",
      body: form,
      credentials: "same-origin",
      headers: { Accept: "application/json" },
    });
  } catch {
    throw new ApiError({
      code: "network-error",
      status: 0,
      message: "Could not reach the Spanwright server. Check your connection and try again.",
    });
  }
  const text = await response.text();
  let data: unknown = null;
  try {
    data = text === "" ? null : (JSON.parse(text) as unknown);
  } catch {
    data = text;
  }
  if (!response.ok) throw parseErrorBody(response.status, data, response.statusText);
  try {
    return parse(data);
  } catch (cause) {
    throw new ApiError({
      code: "invalid-response",
      status: response.status,
      message: "The server sent a response this version of the app does not understand.",
      details: cause instanceof Error ? cause.message : null,
    });
  }
}
