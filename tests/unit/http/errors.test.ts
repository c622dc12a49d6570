import { describe, expect, it } from "vitest";
import { describeError, isDatabaseDown } from "@/lib/http/errors";

/** A query error as drizzle-orm 0.45 wraps the driver's: the query and its parameters in the message, the driver's error as the cause. */
function failedQuery(cause: unknown) {
  return new Error('Failed query: select * from "sessions" where "sessions"."id" = $1\nparams: 0f3d74afcf3af5ad8657b79bfb8b20a5', { cause });
}

describe("isDatabaseDown", () => {
  it("sees a connection that broke under a write, refused or was shut down, through the query wrapper", () => {
    for (const code of ["EPIPE", "ECONNRESET", "ECONNREFUSED", "CONNECTION_CLOSED", "57P01"]) {
      expect(isDatabaseDown(failedQuery(Object.assign(new Error(code), { code }))), code).toBe(true);
    }
  });

  it("leaves other errors alone", () => {
    expect(isDatabaseDown(new Error("boom"))).toBe(false);
    expect(isDatabaseDown(failedQuery(Object.assign(new Error("duplicate key"), { code: "23505" })))).toBe(false);
  });
});

describe("describeError", () => {
  it("keeps the stack and the causes' codes, and leaves out the query parameters", () => {
    const text = describeError(failedQuery(Object.assign(new Error("write EPIPE"), { code: "EPIPE" })));
    expect(text).toContain("Failed query: select");
    expect(text).toContain("at ");
    expect(text).toContain("caused by [EPIPE]: write EPIPE");
    expect(text).not.toContain("params");
    expect(text).not.toContain("0f3d74afcf3a");
  });

  it("survives a cause that points back at itself", () => {
    const err = new Error("loop") as Error & { cause?: unknown };
    err.cause = err;
    expect(describeError(err)).toContain("loop");
  });
});
