import { useQuery } from "@tanstack/react-query";
import { act, renderHook, waitFor } from "@testing-library/react";
import { HttpResponse, delay, http } from "msw";
import { describe, expect, it } from "vitest";
import { ApiError } from "@/lib/api/client";
import { memberQueries, useChangeRole, type Member } from "@/hooks/queries/members";
import { mockApi, testQueryClient } from "@/tests/support/query-client";

// The members hooks against a mocked API (msw intercepts fetch), the way the
// members page uses them: list, error JSON, a slow answer, and a mutation that
// refreshes the list.
const MEMBERS: Member[] = [
  { userId: "11111111-1111-4111-8111-111111111111", name: "Mara Quillon", email: "organiser@cantrove.test", role: "organiser", joinedAt: "2026-11-01T10:00:00Z" },
  { userId: "22222222-2222-4222-8222-222222222222", name: "Tobin Ashgrove", email: "volunteer@cantrove.test", role: "volunteer", joinedAt: "2026-11-02T10:00:00Z" },
];

let members = structuredClone(MEMBERS);
let listCalls = 0;

const refuse = new Map<string, string>();
const server = mockApi([
  http.get("*/api/members", () => {
    listCalls += 1;
    return HttpResponse.json(members);
  }),
  http.patch("*/api/members/:userId", async ({ params, request }) => {
    const { role } = (await request.json()) as { role: Member["role"] };
    const member = members.find((m) => m.userId === params.userId);
    if (!member) return HttpResponse.json({ error: { code: "not_found", message: "That member was not found." } }, { status: 404 });
    // The server's rules are tested against the server (tests/integration/accounts/members.test.ts);
    // here the mock refuses whatever the test marks, so only the hook's handling of a refusal is checked.
    if (refuse.has(member.userId)) {
      return HttpResponse.json({ error: { code: "conflict", message: refuse.get(member.userId) } }, { status: 409 });
    }
    member.role = role;
    return HttpResponse.json(member);
  }),
], () => {
  members = structuredClone(MEMBERS);
  listCalls = 0;
  refuse.clear();
});
const wrapper = () => testQueryClient().wrapper;

describe("members hooks", () => {
  it("loads the group's members", async () => {
    const { result } = renderHook(() => useQuery(memberQueries.list()), { wrapper: wrapper() });
    await waitFor(() => expect(result.current.isSuccess).toBe(true));
    expect(result.current.data?.map((m) => m.name)).toEqual(["Mara Quillon", "Tobin Ashgrove"]);
  });

  it("stays pending through a slow answer, then shows the data", async () => {
    server.use(
      http.get("*/api/members", async () => {
        await delay(400);
        return HttpResponse.json(members.slice(0, 1));
      }),
    );
    const { result } = renderHook(() => useQuery(memberQueries.list()), { wrapper: wrapper() });
    await new Promise((r) => setTimeout(r, 150));
    expect(result.current.isPending).toBe(true);
    expect(result.current.data).toBeUndefined();
    await waitFor(() => expect(result.current.data).toHaveLength(1), { timeout: 2_000 });
  });

  it("turns the API's error JSON into an ApiError the page can show", async () => {
    server.use(
      http.get("*/api/members", () =>
        HttpResponse.json({ error: { code: "forbidden", message: "This needs the organiser role; you are signed in as volunteer." } }, { status: 403 }),
      ),
    );
    const { result } = renderHook(() => useQuery(memberQueries.list()), { wrapper: wrapper() });
    await waitFor(() => expect(result.current.isError).toBe(true));
    const error = result.current.error as ApiError;
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({ status: 403, code: "forbidden" });
    expect(error.message).toMatch(/organiser role/);
  });

  it("reports a network failure in words, not a stack", async () => {
    server.use(http.get("*/api/members", () => HttpResponse.error()));
    const { result } = renderHook(() => useQuery(memberQueries.list()), { wrapper: wrapper() });
    await waitFor(() => expect(result.current.isError).toBe(true));
    expect(result.current.error).toMatchObject({ status: 0, code: "network" });
  });

  it("changes a role and refreshes the list; a refused change keeps the list as it was", async () => {
    const { result } = renderHook(() => ({ list: useQuery(memberQueries.list()), change: useChangeRole() }), { wrapper: wrapper() });
    await waitFor(() => expect(result.current.list.isSuccess).toBe(true));
    expect(listCalls).toBe(1);

    await act(() => result.current.change.mutateAsync({ userId: MEMBERS[1].userId, role: "builder" }));
    await waitFor(() => expect(result.current.list.data?.[1].role).toBe("builder"));
    expect(listCalls).toBe(2);

    refuse.set(MEMBERS[0].userId, "Refused by the server for this test.");
    await act(async () => {
      await expect(result.current.change.mutateAsync({ userId: MEMBERS[0].userId, role: "volunteer" })).rejects.toMatchObject({
        status: 409,
        code: "conflict",
      });
    });
    await waitFor(() => expect(result.current.change.error?.message).toBe("Refused by the server for this test."));
    expect(result.current.list.data?.[0].role).toBe("organiser");
    expect(listCalls).toBe(2);
  });
});
