import { afterAll, describe, expect, it } from "vitest";
import { ApiClient } from "@/tests/support/http";
import { DEMO } from "@/tests/support/env";
import { closeTestDb, testDb } from "@/tests/support/db";
import { mailTo, waitForMail } from "@/tests/support/mail";
import { EMAIL_UNPROVEN } from "@/lib/accounts/schemas";
import { PASSWORD, linkToken, proveAddress, uniqueEmail } from "./helpers";
import { signInFrom } from "./sign-in-from";

afterAll(closeTestDb);

describe("sign-up", () => {
  it("creates the person and a new group with them as its organiser", async () => {
    const email = uniqueEmail("founder");
    const res = await new ApiClient().json<{ group: { id: string; slug: string; name: string }; role: string }>("POST", "/api/signup", {
      name: "Ansel Founder",
      email: email.toUpperCase(),
      password: PASSWORD,
      groupName: "Fennick Street Can Club",
    });
    expect(res.status).toBe(201);
    expect(res.body.group.slug).toMatch(/^fennick-street-can-club-[0-9a-f]{6}$/);
    // Nobody signs in before the address is proven: the form is told to open the link.
    const early = await signInFrom("127.0.0.51", email, PASSWORD);
    expect(early).toMatchObject({ signedIn: false, error: EMAIL_UNPROVEN });
    await proveAddress(email);
    const client = new ApiClient();
    expect(await client.signIn(email, PASSWORD)).toBe(200);
    const me = await client.json<{ user: { email: string }; group: { id: string; name: string }; role: string }>("GET", "/api/me");
    expect(me.body).toMatchObject({ user: { email }, group: { id: res.body.group.id, name: "Fennick Street Can Club" }, role: "organiser" });
    const stored = await testDb()("users").where({ email }).first();
    expect(stored.password_hash).toMatch(/^\$2[aby]\$10\$/);
  });

  it("answers bad input with 422 field errors and writes nothing", async () => {
    const groupsBefore = await testDb()("groups").count("* as n").first();
    const res = await new ApiClient().json<{ error: { code: string; fields: Record<string, string> } }>("POST", "/api/signup", {
      name: "",
      email: "nope",
      password: "short",
      groupName: "x",
    });
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe("invalid_input");
    expect(Object.keys(res.body.error.fields).sort()).toEqual(["email", "groupName", "name", "password"]);
    expect(await testDb()("groups").count("* as n").first()).toEqual(groupsBefore);
  });

  it("answers an e-mail that already has an account exactly as a new one, creates nothing and tells the owner", async () => {
    const fresh = uniqueEmail("fresh");
    const body = (email: string) => ({ name: "Copy Cat", email, password: PASSWORD, groupName: "Another Circle" });
    const groupsBefore = await testDb()("groups").count("* as n").first();
    const taken = await new ApiClient().request("POST", "/api/signup", body(DEMO.volunteer));
    const takenBody = await taken.json();
    expect(await testDb()("groups").count("* as n").first()).toEqual(groupsBefore);
    const open = await new ApiClient().request("POST", "/api/signup", body(fresh));
    const openBody = await open.json();
    expect(taken.status).toBe(201);
    expect(open.status).toBe(201);
    // Same shape, same kinds of values: nothing tells which address has an account.
    const shape = (b: { group: { id: string; slug: string; name: string }; role: string }) => ({
      keys: Object.keys(b).sort(),
      groupKeys: Object.keys(b.group).sort(),
      id: /^[0-9a-f-]{36}$/.test(b.group.id),
      slug: b.group.slug.replace(/[0-9a-f]{6}$/, "…"),
      name: b.group.name,
      role: b.role,
    });
    expect(shape(takenBody)).toEqual(shape(openBody));
    expect(await testDb()("groups").where({ id: takenBody.group.id }).first()).toBeUndefined();
    expect(taken.headers.get("content-type")).toBe(open.headers.get("content-type"));

    const notice = await waitForMail(DEMO.volunteer, (m) => m.headers["x-cantrove-kind"] === "sign_up_attempt");
    expect(notice.subject).toMatch(/Someone tried to open a Cantrove account with your address/);
    expect((await mailTo(DEMO.volunteer)).some((m) => m.headers["x-cantrove-kind"] === "email_verification")).toBe(false);
    // The owner's password is untouched.
    expect(await new ApiClient().signIn(DEMO.volunteer)).toBe(200);
  });

  it("sends the link again on request, only to an account still waiting, and a used link stops working", async () => {
    const email = uniqueEmail("waiting");
    await new ApiClient().json("POST", "/api/signup", { name: "Wren Waiting", email, password: PASSWORD, groupName: "Waiting Circle" });
    const first = await waitForMail(email, (m) => m.headers["x-cantrove-kind"] === "email_verification");
    const resend = await new ApiClient().json<{ message: string }>("POST", "/api/verify-email/resend", { email });
    expect(resend.status).toBe(202);
    const second = await linkToken(email, "email_verification", "verify", new Set([first.id]));
    const proved = await new ApiClient().json<{ email: string }>("POST", "/api/verify-email", { token: second });
    expect(proved).toMatchObject({ status: 200, body: { email } });
    expect(await new ApiClient().signIn(email, PASSWORD)).toBe(200);
    // Every link of that person is used up once one is opened.
    const firstToken = first.text.match(/\/verify\/([A-Za-z0-9_-]+)/)![1];
    expect((await new ApiClient().json("POST", "/api/verify-email", { token: firstToken })).status).toBe(404);
    // A proven address gets no more links; an unknown one gets the same answer and no mail.
    const unknown = uniqueEmail("nobody");
    const again = await new ApiClient().json("POST", "/api/verify-email/resend", { email });
    expect(await new ApiClient().json("POST", "/api/verify-email/resend", { email: unknown })).toEqual(again);
    await new Promise((r) => setTimeout(r, 600));
    expect((await mailTo(email)).filter((m) => m.headers["x-cantrove-kind"] === "email_verification")).toHaveLength(2);
    expect(await mailTo(unknown)).toEqual([]);
  });

  it("refuses a fourth sign-up for one address within the hour (whoever holds it) and sends it at most 3 mails", async () => {
    const email = uniqueEmail("flooded");
    const answers = [];
    for (let i = 0; i < 6; i += 1) {
      answers.push((await new ApiClient().json("POST", "/api/signup", { name: "Flood", email, password: PASSWORD, groupName: `Flood ${i}` })).status);
    }
    // The per-address limit answers the same for every address, so it tells no one which have accounts.
    expect(answers).toEqual([201, 201, 201, 429, 429, 429]);
    await waitForMail(email, (m) => m.headers["x-cantrove-kind"] === "sign_up_attempt");
    await new Promise((r) => setTimeout(r, 800));
    // One confirmation link and two "someone tried" notices: 3 in all.
    expect((await mailTo(email)).map((m) => m.headers["x-cantrove-kind"]).sort()).toEqual(["email_verification", "sign_up_attempt", "sign_up_attempt"]);
  });
});
