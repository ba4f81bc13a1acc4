import { describe, expect, it } from "vitest";
import { isDatabaseUnavailable, isUniqueViolation } from "./dbErrors.js";

describe("isDatabaseUnavailable", () => {
  it.each([
    ["a refused connection", { code: "ECONNREFUSED" }, true],
    ["a driver error wrapped by the ORM", { message: "Failed query", cause: { code: "CONNECTION_CLOSED" } }, true],
    ["an admin shutdown (57P01)", { code: "57P01" }, true],
    ["a connection failure class 08", { code: "08006" }, true],
    ["refusals on every address", new AggregateError([{ code: "ECONNREFUSED" }]), true],
    ["a unique violation", { code: "23505" }, false],
    ["a plain error", new Error("boom"), false],
    ["not an object", "text", false],
  ])("%s -> %s", (_title, error, expected) => {
    expect(isDatabaseUnavailable(error)).toBe(expected);
  });
});

describe("isUniqueViolation", () => {
  it("matches the named constraint only, through causes", () => {
    const error = { cause: { code: "23505", constraint_name: "users_email_key" } };
    expect(isUniqueViolation(error, "users_email_key")).toBe(true);
    expect(isUniqueViolation(error, "other_key")).toBe(false);
  });
});
