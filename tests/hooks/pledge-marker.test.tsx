import { act, cleanup, fireEvent, render, screen } from "@testing-library/react";
import { HttpResponse, http } from "msw";
import { afterEach, describe, expect, it, vi } from "vitest";
import { PledgeMarker } from "@/components/drives/organise/pledge-marker";
import { mockApi } from "@/tests/support/query-client";

const refresh = vi.fn();
vi.mock("next/navigation", () => ({ useRouter: () => ({ refresh }) }));

// Issue 16, pledge life: the organiser marks a pledge received, naming the haul
// that brought it when they know it (POST /api/pledges/{id}/status with haulId;
// the route checks the haul is of the pledge's drop point), or naming none.
const sent: { path: string; body: unknown }[] = [];
mockApi(
  [
    http.post("*/api/pledges/:id/status", async ({ request }) => {
      sent.push({ path: new URL(request.url).pathname, body: JSON.parse(await request.text()) });
      return HttpResponse.json({ id: "pl1", status: "received" });
    }),
  ],
  () => {
    sent.length = 0;
    refresh.mockClear();
  },
);

const hauls = [
  { value: "h-new", label: "12 Dec 2026, 10:00 · 3 bags" },
  { value: "h-old", label: "5 Dec 2026, 09:30 · 1 bag" },
];

afterEach(cleanup);

describe("marking a pledge received", () => {
  it("names the chosen haul of the drop point", async () => {
    render(<PledgeMarker id="pl1" status="pledged" label="2 bags to the hall" hauls={hauls} />);
    fireEvent.change(screen.getByLabelText(/Brought in by/), { target: { value: "h-old" } });
    await act(async () => fireEvent.click(screen.getByRole("button", { name: "Received" })));
    expect(sent).toEqual([{ path: "/api/pledges/pl1/status", body: { status: "received", haulId: "h-old" } }]);
    expect(refresh).toHaveBeenCalledTimes(1);
  });

  it("names none when the organiser does not know which haul, and never names one for 'not brought'", async () => {
    const { unmount } = render(<PledgeMarker id="pl1" status="pledged" label="2 bags to the hall" hauls={hauls} />);
    await act(async () => fireEvent.click(screen.getByRole("button", { name: "Received" })));
    unmount();
    render(<PledgeMarker id="pl1" status="pledged" label="2 bags to the hall" hauls={hauls} />);
    fireEvent.change(screen.getByLabelText(/Brought in by/), { target: { value: "h-new" } });
    await act(async () => fireEvent.click(screen.getByRole("button", { name: "Not brought" })));
    expect(sent.map((s) => s.body)).toEqual([{ status: "received" }, { status: "notBrought" }]);
  });

  it("offers no haul choice when the drop point has had no haul, or once the pledge is marked", () => {
    const { unmount } = render(<PledgeMarker id="pl1" status="pledged" label="x" hauls={[]} />);
    expect(screen.queryByLabelText(/Brought in by/)).toBeNull();
    unmount();
    render(<PledgeMarker id="pl1" status="received" label="x" hauls={hauls} />);
    expect(screen.queryByLabelText(/Brought in by/)).toBeNull();
    expect(screen.getByRole("button", { name: "Undo the mark" })).toBeTruthy();
  });
});
