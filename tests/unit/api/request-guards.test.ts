import { describe, expect, it } from "vitest";
import { AppError } from "@/lib/api/errors";
import { assertJsonContent, assertNoNul, assertSameOrigin } from "@/lib/api/request-guards";
import { appErrorFromDatabase } from "@/lib/api/pg-errors";

const code = (fn: () => void) => {
  try {
    fn();
    return "passed";
  } catch (error) {
    return error instanceof AppError ? `${error.status}` : "other";
  }
};

const post = (headers: Record<string, string>) => new Request("http://127.0.0.1:3000/api/drives", { method: "POST", headers });

// Sec-Fetch-Site values and their meaning: W3C "Fetch Metadata Request Headers", section 2.4.
describe("assertSameOrigin", () => {
  it("lets the app's own pages and non-browser clients write", () => {
    expect(code(() => assertSameOrigin(post({ "sec-fetch-site": "same-origin" })))).toBe("passed");
    expect(code(() => assertSameOrigin(post({ "sec-fetch-site": "none" })))).toBe("passed");
    expect(code(() => assertSameOrigin(post({})))).toBe("passed");
    expect(code(() => assertSameOrigin(post({ origin: "http://127.0.0.1:3000", host: "127.0.0.1:3000" })))).toBe("passed");
  });

  it("refuses another site, and another port of the same host (same-site)", () => {
    expect(code(() => assertSameOrigin(post({ "sec-fetch-site": "cross-site" })))).toBe("403");
    expect(code(() => assertSameOrigin(post({ "sec-fetch-site": "same-site" })))).toBe("403");
    expect(code(() => assertSameOrigin(post({ origin: "http://127.0.0.1:8026", host: "127.0.0.1:3000" })))).toBe("403");
    expect(code(() => assertSameOrigin(post({ origin: "null" })))).toBe("403");
  });

  it("never refuses a read", () => {
    const get = new Request("http://127.0.0.1:3000/api/drives", { headers: { "sec-fetch-site": "cross-site" } });
    expect(code(() => assertSameOrigin(get))).toBe("passed");
  });
});

describe("assertJsonContent", () => {
  it("takes application/json and +json types, and empty bodies", () => {
    expect(code(() => assertJsonContent(post({ "content-type": "application/json; charset=utf-8" }), "{}"))).toBe("passed");
    expect(code(() => assertJsonContent(post({ "content-type": "application/merge-patch+json" }), "{}"))).toBe("passed");
    expect(code(() => assertJsonContent(post({}), ""))).toBe("passed");
  });

  it("refuses the types a plain HTML form or a no-preflight fetch can send", () => {
    // The three "CORS-safelisted" request content types (Fetch standard, 4.1): text/plain,
    // application/x-www-form-urlencoded, multipart/form-data.
    for (const type of ["text/plain", "application/x-www-form-urlencoded", "multipart/form-data; boundary=x"]) {
      expect(code(() => assertJsonContent(post({ "content-type": type }), "{}"))).toBe("415");
    }
    expect(code(() => assertJsonContent(post({}), "{}"))).toBe("415");
  });
});

describe("assertNoNul", () => {
  it("finds NUL in nested strings and keys, and names the field", () => {
    expect(code(() => assertNoNul({ a: ["ok", { b: "x\u0000y" }] }))).toBe("422");
    expect(code(() => assertNoNul({ ["k\u0000"]: 1 }))).toBe("422");
    expect(code(() => assertNoNul({ a: "fine", n: 3, t: true, z: null }))).toBe("passed");
    try {
      assertNoNul({ notes: { text: "\u0000" } });
    } catch (error) {
      expect((error as AppError).fields).toEqual({ "notes.text": expect.stringMatching(/NUL/) });
    }
  });

  it("never names a made-up key in its answer", () => {
    try {
      assertNoNul({ "$$; select pg_sleep(5); $$": "\u0000" });
      throw new Error("expected a refusal");
    } catch (error) {
      expect((error as AppError).fields).toEqual({ _: expect.stringMatching(/NUL/) });
    }
  });
});

// SQLSTATE values from the PostgreSQL manual, appendix A "PostgreSQL Error Codes".
describe("appErrorFromDatabase", () => {
  it("maps constraint and data errors to 409 and 422", () => {
    expect(appErrorFromDatabase({ code: "23505" })?.status).toBe(409); // unique_violation
    expect(appErrorFromDatabase({ code: "40001" })?.status).toBe(409); // serialization_failure
    expect(appErrorFromDatabase({ code: "23503" })?.status).toBe(422); // foreign_key_violation
    expect(appErrorFromDatabase({ code: "23514" })?.status).toBe(422); // check_violation
    expect(appErrorFromDatabase({ code: "22008" })?.status).toBe(422); // datetime_field_overflow
    expect(appErrorFromDatabase({ code: "22021" })?.status).toBe(422); // character_not_in_repertoire
  });

  it("leaves everything else alone (the server's fault stays a 500, an outage a 503)", () => {
    expect(appErrorFromDatabase({ code: "57P01" })).toBeNull(); // admin_shutdown
    expect(appErrorFromDatabase({ code: "42P01" })).toBeNull(); // undefined_table: our bug
    expect(appErrorFromDatabase(new Error("boom"))).toBeNull();
    expect(appErrorFromDatabase(null)).toBeNull();
  });
});
