import { afterAll, describe, expect, it } from "vitest";
import { ApiClient } from "@/tests/support/http";
import { closeTestDb, testDb } from "@/tests/support/db";
import { freshGroup } from "@/tests/support/ledger";
import { PUBLIC_LIMITS } from "@/lib/drives/limits";
import { ACCOUNT_LIMITS } from "@/lib/accounts/limits";

afterAll(closeTestDb);

type ErrorJson = { error: { code: string; message: string } };

async function expectLimited(res: Response) {
  expect(res.status).toBe(429);
  const retryAfter = Number(res.headers.get("retry-after"));
  expect(retryAfter).toBeGreaterThan(0);
  const body = (await res.json()) as ErrorJson;
  expect(body.error.code).toBe("rate_limited");
  expect(body.error.message).toMatch(/try again/i);
}

describe("limits on anonymous and mail-sending writes", () => {
  it("a client that pledges past its allowance gets 429 with Retry-After; another client is not affected", async () => {
    const g = await freshGroup("limit-pledge");
    const flood = new ApiClient();
    const pledge = (c: ApiClient) =>
      c.post(`/api/public/drives/${g.driveSlug}/pledges`, { dropPointId: g.dropPointIds[0], bags: 1, bringOn: "2026-12-12" });
    const statuses: number[] = [];
    for (let i = 0; i < PUBLIC_LIMITS.pledgePerClient.points; i++) statuses.push((await pledge(flood)).status);
    expect(statuses.every((s) => s === 201)).toBe(true);
    await expectLimited(await pledge(flood));
    expect((await pledge(new ApiClient())).status).toBe(201);
    const count = await testDb()("pledges").where({ drive_id: g.driveId }).count<{ n: string }[]>("* as n");
    expect(Number(count[0].n)).toBe(PUBLIC_LIMITS.pledgePerClient.points + 1);
  });

  it("pledges naming one address are limited across clients", async () => {
    const g = await freshGroup("limit-pledge-address");
    const email = `target-${g.groupId.slice(0, 8)}@example.test`;
    const statuses: number[] = [];
    for (let i = 0; i <= PUBLIC_LIMITS.pledgePerAddress.points; i++) {
      const res = await new ApiClient().post(`/api/public/drives/${g.driveSlug}/pledges`, { dropPointId: g.dropPointIds[0], bags: 1, bringOn: "2026-12-12", email });
      statuses.push(res.status);
      if (res.status === 429) await expectLimited(res);
    }
    expect(statuses.slice(0, -1).every((s) => s === 201)).toBe(true);
    expect(statuses.at(-1)).toBe(429);
  });

  it("bad input does not use up anyone's allowance", async () => {
    const g = await freshGroup("limit-bad-input");
    const client = new ApiClient();
    for (let i = 0; i < PUBLIC_LIMITS.fillReportPerClient.points + 5; i++) {
      const res = await client.post(`/api/public/drives/${g.driveSlug}/drop-points/${g.dropPointIds[0]}/fill-reports`, { level: "nonsense" });
      expect(res.status).toBe(422);
    }
    const ok = await client.post(`/api/public/drives/${g.driveSlug}/drop-points/${g.dropPointIds[0]}/fill-reports`, { level: 50 });
    expect(ok.status).toBe(201);
  });

  it("password-reset mails to one address are limited, whoever asks", async () => {
    const email = `nobody-${Date.now()}@example.test`;
    const statuses: number[] = [];
    for (let i = 0; i <= ACCOUNT_LIMITS.resetPerAddress.points; i++) {
      statuses.push((await new ApiClient().post("/api/password-reset", { email })).status);
    }
    expect(statuses.slice(0, -1).every((s) => s >= 200 && s < 300)).toBe(true);
    expect(statuses.at(-1)).toBe(429);
  });

  it("sign-up allows at least 30 an hour from one client address (CONTRACT.md)", async () => {
    const client = new ApiClient();
    const stamp = Date.now().toString(36);
    for (let i = 0; i < 30; i++) {
      const res = await client.post("/api/signup", { name: "Class Member", email: `class-${stamp}-${i}@example.test`, password: "a-long-test-password", groupName: `Class ${stamp} ${i}` });
      expect(res.status).toBe(201);
    }
  }, 120_000);
});
