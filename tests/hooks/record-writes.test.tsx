import { act, renderHook } from "@testing-library/react";
import { HttpResponse, http } from "msw";
import { describe, expect, it } from "vitest";
import { driveKeys } from "@/hooks/queries/drives";
import { useRecordAction } from "@/hooks/queries/drive-writes";
import { heaterKeys, useChangeGlazing } from "@/hooks/queries/heaters";
import { ledgerKeys } from "@/hooks/queries/ledger";
import { mockApi, testQueryClient } from "@/tests/support/query-client";

// Issue 16's writes: each posts where it should, with a fresh Idempotency-Key
// (delete with its confirmation), and refreshes only its own domain's reads.
const sent: { path: string; key: string | null; body: unknown }[] = [];
const record = async ({ request }: { request: Request }) => {
  sent.push({ path: new URL(request.url).pathname, key: request.headers.get("idempotency-key"), body: JSON.parse(await request.text()) });
  return HttpResponse.json({ ok: true });
};
mockApi(
  [
    http.post("*/api/drop-points/:id/archive", record),
    http.post("*/api/pledges/:id/delete", record),
    http.post("*/api/heaters/:id/glazing", async (ctx) => {
      await record(ctx);
      return HttpResponse.json({ id: "u1", name: "Unit", cans: 156, state: "planned", was: 132 });
    }),
  ],
  () => {
    sent.length = 0;
  },
);

function setup() {
  const { client, wrapper } = testQueryClient({ staleTime: Infinity });
  const seeded = { drives: driveKeys.list(), heaters: heaterKeys.list(), ledger: ledgerKeys.mine() };
  for (const key of Object.values(seeded)) client.setQueryData(key, []);
  const stale = () => Object.fromEntries(Object.entries(seeded).map(([name, key]) => [name, client.getQueryState(key)?.isInvalidated ?? false]));
  return { wrapper, stale };
}

describe("archive, delete and glazing hooks", () => {
  it("archiving posts an empty body with a key and refreshes the drives' reads only", async () => {
    const { wrapper, stale } = setup();
    const { result } = renderHook(() => useRecordAction(), { wrapper });
    await act(() => result.current.mutateAsync({ kind: "dropPoint", id: "p1", action: "archive" }));
    expect(sent).toEqual([{ path: "/api/drop-points/p1/archive", key: expect.stringMatching(/^[0-9a-f-]{36}$/), body: {} }]);
    expect(stale()).toEqual({ drives: true, heaters: false, ledger: false });
  });

  it("deleting sends the confirmation, and two deletes carry two keys", async () => {
    const { wrapper } = setup();
    const { result } = renderHook(() => useRecordAction(), { wrapper });
    await act(() => result.current.mutateAsync({ kind: "pledge", id: "x1", action: "delete" }));
    await act(() => result.current.mutateAsync({ kind: "pledge", id: "x1", action: "delete" }));
    expect(sent.map((s) => s.body)).toEqual([{ confirm: true }, { confirm: true }]);
    expect(sent[0].key).not.toBe(sent[1].key);
  });

  it("a new glazing posts the plan and refreshes the units and the ledger's reads, not the drives'", async () => {
    const { wrapper, stale } = setup();
    const { result } = renderHook(() => useChangeGlazing("u1"), { wrapper });
    const plan = { glazingWidth: 860, glazingHeight: 1500, unit: "mm" as const, coverage: "chamber" as const };
    await act(() => result.current.mutateAsync(plan));
    expect(sent).toEqual([{ path: "/api/heaters/u1/glazing", key: expect.any(String), body: { plan } }]);
    expect(stale()).toEqual({ drives: false, heaters: true, ledger: true });
  });
});
