import "fake-indexeddb/auto";
import { describe, expect, it } from "vitest";
import { unsentCount } from "@/lib/offline/forget";
import { putEntry, setPerson } from "@/lib/offline/store";

// Leaving a group (or signing out) deletes every entry this phone keeps for the person, in
// every group; the warning counts them all and says how many are of the group being left,
// the only ones its Log page shows.
const entry = (key: string, group: string | undefined) => ({
  key,
  url: "/api/drives/d1/hauls",
  body: { dropPointId: "p1", bags: 2 },
  label: "Haul: 2 bags",
  createdAt: "2026-12-04T10:42:00.000Z",
  attempts: 0,
  owner: "u1",
  group,
  state: "waiting" as const,
});

describe("entries not sent yet, before leaving", () => {
  it("counts the person's entries in all, and those of the group being left", async () => {
    expect(await unsentCount("g1")).toEqual({ all: 0, here: 0 });
    await setPerson({ id: "u1", group: "g1", home: "/log" });
    await putEntry(entry("k1", "g1"));
    await putEntry(entry("k2", "g2"));
    await putEntry(entry("k3", "g2"));
    await putEntry({ ...entry("k4", "g1"), owner: "u2" }); // someone else's: not this person's to lose
    expect(await unsentCount("g1")).toEqual({ all: 3, here: 1 });
    expect(await unsentCount("g2")).toEqual({ all: 3, here: 2 });
  });
});
