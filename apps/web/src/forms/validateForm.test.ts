import { describe, expect, it } from "vitest";
import { z } from "zod";
import { inviteMemberRequestSchema, signUpRequestSchema, updateProjectRequestSchema } from "@spanwright/contracts";
import { ApiError } from "../api/client";
import { formLevelMessage, mergeFieldErrors, validateForm } from "./validateForm";

describe("validateForm", () => {
  it("returns the parsed data of valid input (contract transforms applied)", () => {
    const result = validateForm(inviteMemberRequestSchema, { email: "  Ada@Example.TEST ", role: "checker" });
    expect(result).toEqual({ ok: true, data: { email: "ada@example.test", role: "checker" } });
  });

  it("gives one plain message per field for the sign-up contract", () => {
    const result = validateForm(signUpRequestSchema, { name: "", email: "not-an-email", password: "short" });
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.errors).toEqual({
      name: "Required.",
      email: "Enter a valid e-mail address.",
      // The contract's own wording wins over the generic message.
      password: "at least 10 characters",
    });
  });

  it("names missing and non-numeric numbers in words", () => {
    const schema = z.object({ threshold: z.number().min(0).max(100) });
    const missing = validateForm(schema, {});
    const tooBig = validateForm(schema, { threshold: 250 });
    expect(missing.ok ? null : missing.errors.threshold).toBe("Enter a number.");
    expect(tooBig.ok ? null : tooBig.errors.threshold).toBe("Use 100 or less.");
  });

  it("reports a whole-object rule under the empty key", () => {
    const result = validateForm(updateProjectRequestSchema, {});
    expect(result.ok ? null : result.errors[""]).toBe("give at least one field to change");
  });
});

describe("mergeFieldErrors", () => {
  const server = new ApiError({
    code: "invalid-request",
    status: 400,
    message: "Invalid body",
    details: { issues: [{ path: "email", message: "server email" }, { path: "name", message: "server name" }] },
  });

  it("shows server field errors where the client found none, and client errors first", () => {
    expect(mergeFieldErrors({ email: "client email" }, server)).toEqual({
      email: "client email",
      name: "server name",
    });
  });

  it("ignores errors that are not from the API", () => {
    expect(mergeFieldErrors({}, new Error("boom"))).toEqual({});
  });
});

describe("formLevelMessage", () => {
  it("is null when nothing failed", () => {
    expect(formLevelMessage(null, ["email"])).toBeNull();
  });

  it("is null when every server problem is shown beside a field of the form", () => {
    const error = new ApiError({
      code: "invalid-request",
      status: 400,
      message: "Invalid body",
      details: { issues: [{ path: "email", message: "bad" }] },
    });
    expect(formLevelMessage(error, ["email", "password"])).toBeNull();
  });

  it("gives the server's message when a problem has no field on this form", () => {
    const error = new ApiError({ code: "rate-limited", status: 429, message: "Too many attempts" });
    expect(formLevelMessage(error, ["email"])).toBe("Too many attempts");
  });
});
