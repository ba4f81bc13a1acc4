import type { z } from "zod";
import { AppError } from "./appError.js";

/** Parses a request part with a zod schema; failures become 400 `invalid-request` naming each field. */
export function parseRequest<S extends z.ZodType>(schema: S, value: unknown, where = "body"): z.output<S> {
  const result = schema.safeParse(value ?? {});
  if (result.success) return result.data;
  const issues = result.error.issues.map((issue) => ({
    path: issue.path.map(String).join("."),
    message: issue.message,
  }));
  const first = issues[0];
  const message = first
    ? `${where}${first.path ? `.${first.path}` : ""}: ${first.message}`
    : `invalid ${where}`;
  throw new AppError("invalid-request", message, { issues });
}
