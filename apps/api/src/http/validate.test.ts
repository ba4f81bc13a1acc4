import { z } from "zod";
import { describe, expect, it } from "vitest";
import { parseRequest } from "./validate.js";

describe("parseRequest", () => {
  const schema = z.object({ name: z.string().min(1), spans: z.array(z.object({ L: z.number().positive() })) });

  it("returns the parsed value", () => {
    expect(parseRequest(schema, { name: "a", spans: [{ L: 2 }] })).toEqual({ name: "a", spans: [{ L: 2 }] });
  });

  it("throws invalid-request naming every nested field path", () => {
    expect(() => parseRequest(schema, { name: "", spans: [{ L: 1 }, { L: -1 }] })).toThrow(
      expect.objectContaining({
        code: "invalid-request",
        message: expect.stringMatching(/^body\.name: /),
        details: { issues: [expect.objectContaining({ path: "name" }), expect.objectContaining({ path: "spans.1.L" })] },
      }),
    );
  });

  it("treats a missing body as an empty object", () => {
    expect(() => parseRequest(schema, undefined)).toThrow(expect.objectContaining({ code: "invalid-request" }));
  });
});
