import { mkdtempSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { UTApi, UTFile } from "uploadthing/server";
import { sendMail } from "@/lib/mail/outbox";
import { startUploadFake, uploadToken } from "@/scripts/fakes/upload-fake";
import { closeTestDb, testDb } from "@/tests/support/db";
import { waitForMail } from "@/tests/support/mail";
import { freePort } from "@/tests/support/ports";
import { db } from "@/lib/db";

afterAll(async () => {
  await closeTestDb();
  await db.destroy();
});

describe("e-mail through the outbox and the SMTP capture", () => {
  it("delivers a message, marks it sent, and tags it with the group", async () => {
    const group = await testDb()("groups").where({ slug: "larkhollow-warm-rooms" }).first();
    const to = `outbox-${Date.now()}@cantrove.test`;
    const result = await sendMail({ groupId: group.id, to, subject: "Bin at the library is full", text: "Please empty it." });
    expect(result.sent).toBe(true);
    const mail = await waitForMail(to);
    expect(mail.subject).toBe("Bin at the library is full");
    expect(mail.headers["x-cantrove-group"]).toBe(group.id);
    const row = await testDb()("outbox").where({ id: result.id }).first();
    expect(row.status).toBe("sent");
  });
});

describe("uploads through the uploadthing SDK and the local upload service", () => {
  it("serves the demo drop point photo uploaded by the seed", async () => {
    // The seed's photo: the first one made, and never archived (other tests add photos of their own).
    const file = await testDb()("files").where({ purpose: "drop-point-photo" }).whereNull("archived_at").orderBy("created_at").first();
    expect(file).toBeTruthy();
    const res = await fetch(file.url);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("image/png");
    const bytes = new Uint8Array(await res.arrayBuffer());
    // PNG signature, ISO/IEC 15948 §5.2
    expect([...bytes.slice(0, 8)]).toEqual([137, 80, 78, 71, 13, 10, 26, 10]);
  });

  it("keeps a file across a restart of the upload service", async () => {
    const dir = mkdtempSync(path.join(os.tmpdir(), "uploads-"));
    const port = await freePort();
    const apiKey = "sk_test_restart";
    let fake = await startUploadFake({ dir, port, apiKey });
    const api = new UTApi({ token: uploadToken(apiKey, "restart-test"), ingestUrl: fake.origin });
    const content = new TextEncoder().encode("larkhollow sign proof");
    const [result] = await api.uploadFiles([new UTFile([content], "sign.txt", { type: "text/plain" })]);
    expect(result.error).toBeNull();
    await fake.close();
    fake = await startUploadFake({ dir, port, apiKey });
    const res = await fetch(result.data!.ufsUrl);
    expect(await res.text()).toBe("larkhollow sign proof");
    await fake.close();
    rmSync(dir, { recursive: true, force: true });
  });

  it("refuses a PUT whose signature does not match", async () => {
    const dir = mkdtempSync(path.join(os.tmpdir(), "uploads-"));
    const port = await freePort();
    const fake = await startUploadFake({ dir, port, apiKey: "sk_test_sig" });
    const form = new FormData();
    form.set("file", new Blob(["x"]), "x.txt");
    const res = await fetch(`${fake.origin}/somekey?expires=${Date.now() + 60_000}&signature=hmac-sha256%3Ddeadbeef`, { method: "PUT", body: form });
    expect(res.status).toBe(403);
    await fake.close();
    rmSync(dir, { recursive: true, force: true });
  });
});
