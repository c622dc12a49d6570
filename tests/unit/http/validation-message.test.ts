// A refused form says what to change, by field, rather than "The request body is not valid."
import { describe, expect, it } from "vitest";
import { z } from "@/lib/validation/zod";
import { parseWith, validationMessage } from "@/lib/http/body";
import { HttpError } from "@/lib/http/errors";

describe("validationMessage", () => {
  it("names each field as a person counts it and says to change it", () => {
    expect(validationMessage({ name: ["Give the show a name."] })).toBe("The form needs a change: name: Give the show a name. Change it and send again.");
    expect(validationMessage({ "positions.0.facingDeg": ["Must be a number."], x: ["Too big."] })).toBe(
      "The form needs changes: positions, 1, facing deg: Must be a number.; x: Too big. Change them and send again.",
    );
  });

  it("is what parseWith refuses with, keeping the issues", () => {
    const schema = z.object({ name: z.string().min(1, "Give the show a name.") });
    try {
      parseWith(schema, { name: "" }, "The form");
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(HttpError);
      const err = e as HttpError;
      expect(err.message).not.toMatch(/is not valid/);
      expect(err.message).toContain("name: Give the show a name");
      expect(err.extra.issues).toEqual({ name: ["Give the show a name."] });
    }
  });
});
