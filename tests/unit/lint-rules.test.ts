import { mkdirSync, rmSync, writeFileSync } from "node:fs";
import path from "node:path";
import { ESLint } from "eslint";
import { afterAll, describe, expect, it } from "vitest";

// The linter's own rules of shape (eslint.config.mjs) fire on what they exist
// to stop, and stay quiet on code that keeps them: a rule that never fires
// would let `npm test` pass on a boundary break, a cycle or an oversized file.
const root = path.resolve(import.meta.dirname, "../..");
const eslint = new ESLint({ cwd: root });
// Samples are real files (the cycle rule reads imports from disk), in a scratch
// folder under the layer they stand for, removed afterwards.
const scratchName = `__lint_scratch_${process.pid}`;
const scratch = (top: string) => path.join(root, top, scratchName);
afterAll(() => {
  for (const top of ["lib", "components", "tests"]) rmSync(scratch(top), { recursive: true, force: true });
});

function writeSample(file: string, code: string): string {
  const [top, ...rest] = file.split("/");
  const full = path.join(scratch(top!), ...rest);
  mkdirSync(path.dirname(full), { recursive: true });
  writeFileSync(full, code);
  return full;
}

async function rulesFor(file: string, code: string): Promise<string[]> {
  const [result] = await eslint.lintFiles([writeSample(file, code)]);
  return result!.messages.map((m) => m.ruleId ?? `fatal: ${m.message}`);
}

describe("the linter's rules of shape", { timeout: 60_000 }, () => {
  it("passes a lib module that keeps every rule", async () => {
    expect(await rulesFor("lib/lint-sample.ts", 'import { UUID } from "@/lib/api/path";\n\nexport const isId = (v: string) => UUID.test(v);\n')).toEqual([]);
  });

  it("refuses a lib module that imports a component, and a component that imports a page", async () => {
    expect(await rulesFor("lib/lint-sample.ts", 'import { Button } from "@/components/ui/button";\n\nexport const b = Button;\n')).toContain("no-restricted-imports");
    expect(await rulesFor("components/lint-sample.tsx", 'import Page from "@/app/(public)/page";\n\nexport const p = Page;\n')).toContain("no-restricted-imports");
  });

  it("refuses a file over 250 lines outside tests and migrations", async () => {
    const long = Array.from({ length: 251 }, (_, i) => `export const n${i} = ${i};`).join("\n") + "\n";
    expect(await rulesFor("lib/lint-sample.ts", long)).toContain("max-lines");
    expect(await rulesFor("tests/lint-sample.ts", long)).not.toContain("max-lines");
  });

  it("refuses a query module that is not server-only", async () => {
    expect(await rulesFor("lib/sample-queries.ts", "export const q = 1;\n")).toContain("cantrove/server-only-queries");
    expect(await rulesFor("lib/sample-queries.ts", 'import "server-only";\n\nexport const q = 1;\n')).toEqual([]);
  });

  it("refuses a computation that reaches the database or Next.js", async () => {
    expect(await rulesFor("lib/heaters/can-grid.ts", 'import { db } from "@/lib/db";\n\nexport const d = db;\n')).toContain("no-restricted-imports");
    expect(await rulesFor("lib/drives/progress.ts", 'import { headers } from "next/headers";\n\nexport const h = headers;\n')).toContain("no-restricted-imports");
    // The same import outside the list of computations is allowed.
    expect(await rulesFor("lib/drives/lint-sample.ts", 'import { db } from "@/lib/db";\n\nexport const d = db;\n')).toEqual([]);
  });

  it("refuses a component that calls fetch itself instead of the one fetch wrapper", async () => {
    expect(await rulesFor("components/lint-sample.tsx", 'export const load = () => fetch("/api/me");\n')).toContain("no-restricted-globals");
    expect(await rulesFor("components/lint-sample.tsx", 'import { fetchJson } from "@/lib/api/client";\n\nexport const load = () => fetchJson("/api/me");\n')).toEqual([]);
  });

  it("refuses a switched-off rule without a reason, or for a whole file", async () => {
    const line = "export const f = (x: any) => x;\n";
    expect(await rulesFor("lib/lint-sample.ts", `// eslint-disable-next-line @typescript-eslint/no-explicit-any\n${line}`)).toContain("cantrove/disable-with-reason");
    expect(await rulesFor("lib/lint-sample.ts", `/* eslint-disable @typescript-eslint/no-explicit-any -- reason */\n${line}`)).toContain("cantrove/disable-with-reason");
    expect(await rulesFor("lib/lint-sample.ts", `// eslint-disable-next-line @typescript-eslint/no-explicit-any -- why it is fine here\n${line}`)).toEqual([]);
  });

  it("refuses a write to the ledger's totals and a sum over ledger lines outside the database functions", async () => {
    const head = 'import { db } from "@/lib/db";\n\n';
    expect(await rulesFor("lib/lint-sample.ts", `${head}export const w = () => db("stage_balances").where({ stage: "good" }).update({ quantity: 1 });\n`)).toContain("no-restricted-syntax");
    expect(await rulesFor("lib/lint-sample.ts", `${head}export const s = () => db("ledger_lines as l").sum("quantity");\n`)).toContain("no-restricted-syntax");
    expect(await rulesFor("lib/lint-sample.ts", `${head}export const r = () => db("stage_balances").where({ stage: "good" }).first("quantity");\n`)).toEqual([]);
  });

  it("refuses an import cycle", async () => {
    // Both files exist before either is linted: the import plugin keeps what it resolved for a while.
    writeSample("lib/cycle/b.ts", 'import { a } from "./a";\n\nexport const b = (): unknown => a;\n');
    expect(await rulesFor("lib/cycle/a.ts", 'import { b } from "./b";\n\nexport const a = () => b();\n')).toContain("import/no-cycle");
  });
});
