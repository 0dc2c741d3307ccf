import { describe, expect, it } from "vitest";
import { lastWriteLsn, lsnValue, noteWriteLsn } from "@/lib/cache/write-fence";

// WAL positions as PostgreSQL prints pg_lsn: two hexadecimal halves "hi/lo", the
// high 32 bits and the low 32 bits (PostgreSQL 15 manual, 8.20 "pg_lsn Type").
describe("write fence", () => {
  it("orders pg_lsn text the way the WAL does", () => {
    expect(lsnValue("0/30A4398")).toBe(0x30a4398n);
    expect(lsnValue("16/B374D848")).toBe((0x16n << 32n) + 0xb374d848n);
    // "1/0" is past "0/FFFFFFFF": comparing the text would say otherwise.
    expect(lsnValue("1/0")! > lsnValue("0/FFFFFFFF")!).toBe(true);
    expect(lsnValue("nonsense")).toBeNull();
    expect(lsnValue(undefined)).toBeNull();
  });

  it("keeps the newest write it was told of, never going back", () => {
    noteWriteLsn("0/5000");
    noteWriteLsn("0/4000");
    noteWriteLsn("garbage");
    expect(lastWriteLsn()).toBe(0x5000n);
    noteWriteLsn("1/10");
    expect(lastWriteLsn()).toBe((1n << 32n) + 0x10n);
  });
});
