// The linter `npm test` runs first (scripts/test.sh). Next's own rules (React,
// hooks, accessibility, TypeScript) plus the rules of this codebase's shape,
// so they are checked rather than hoped for:
// - layers: app → components → hooks → lib, never back (lib imports no UI);
// - no import cycles;
// - a module under lib/ named *queries*.ts is server-only;
// - the computations (PURE below) import no database, Next.js or server-only code;
// - the browser side fetches only through lib/api/client.ts;
// - the ledger's tables are written only by the database functions, and ledger lines are not read
//   (summed) outside lib/ledger's list;
// - a rule is switched off for one line only, with ` -- reason`;
// - files stay under 250 lines (tests and migrations excepted).
// tests/unit/lint-rules.test.ts proves each of these fires.
import nextVitals from "eslint-config-next/core-web-vitals";
import nextTs from "eslint-config-next/typescript";

const MAX_LINES = 250;

/** Our one local rule: query modules must say `import "server-only"`, so a client bundle that reaches one fails the build. */
const serverOnlyQueries = {
  meta: { type: "problem", messages: { missing: 'A query module is server-only: add `import "server-only";` at its top.' }, schema: [] },
  create(context) {
    return {
      Program(node) {
        const has = node.body.some((s) => s.type === "ImportDeclaration" && s.source.value === "server-only");
        if (!has) context.report({ node, messageId: "missing" });
      },
    };
  },
};

/** A rule is switched off for one line only, and says why: `// eslint-disable-next-line rule -- reason`. */
const disableWithReason = {
  meta: { type: "problem", messages: { reason: "Say why after ` -- `, and switch the rule off for one line only (eslint-disable-next-line / -line)." }, schema: [] },
  create(context) {
    return {
      Program() {
        for (const comment of context.sourceCode.getAllComments()) {
          const text = comment.value.trim();
          if (!/^eslint-disable/.test(text)) continue;
          const oneLine = /^eslint-disable-(next-)?line\b/.test(text);
          const why = /\s--\s*\S/.test(text);
          if (!oneLine || !why) context.report({ loc: comment.loc, messageId: "reason" });
        }
      },
    };
  },
};

const layer = (from, banned, why) => ({
  files: from,
  rules: {
    "no-restricted-imports": ["error", { patterns: banned.map((group) => ({ group: [group], message: why })) }],
  },
});

/** The computations: plain functions of their inputs, so unit tests and the browser can run them. */
const PURE = [
  "drives/progress", "drives/progress-wording", "drives/fill", "heaters/can-grid", "heaters/heat", "heaters/sun",
  "heaters/materials", "heaters/need", "heaters/states", "heaters/build-steps", "ledger/estimate", "ledger/allocate",
  "ledger/daily-series", "ledger/plausibility", "ledger/entry-time", "map/tiles", "runs/great-circle",
  "runs/route-order", "runs/state", "runs/suggest",
];
const IMPURE = ["@/lib/db", "knex", "pg", "next/*", "server-only", "@/lib/**/*queries*", "@/lib/**/commands", "@/lib/auth/queries", "@/lib/auth/options", "@/lib/auth/session*", "@/lib/auth/require*", "@/lib/api/endpoint", "@/lib/api/handler", "@/lib/api/action", "@/lib/api/idempotency", "@/lib/api/rate-limit*"];

/** The ledger's running totals: written only by the database functions in db/functions/. */
const TOTALS = "stage_balances|reject_tallies|drop_point_tallies|drive_daily_good|group_calibration|ledger_lines|movements";
const writesTotals = {
  selector: `CallExpression[callee.property.name=/^(insert|update|upsert|del|delete|increment|decrement|merge|truncate)$/] > MemberExpression Literal[value=/^(${TOTALS})( as \\w+)?$/]`,
  message: "The ledger and its running totals are written only by the database functions (db/functions/, through lib/ledger/post.ts).",
};
const readsLines = {
  selector: "CallExpression[callee.name=/^(db|trx|knex)$/] > Literal[value=/^ledger_lines( as \\w+)?$/]",
  message: "Balances come from the running totals; ledger lines are listed only by lib/ledger/ledger-list.ts.",
};
const ledgerRules = [
  { files: ["app/**", "components/**", "hooks/**", "lib/**"], ignores: ["lib/bench/**"], rules: { "no-restricted-syntax": ["error", writesTotals, readsLines] } },
  { files: ["lib/ledger/ledger-list.ts"], rules: { "no-restricted-syntax": ["error", writesTotals] } },
];

const config = [
  { ignores: [".next/**", "node_modules/**", "public/**", ".test-results/**", ".pgdata/**", "next-env.d.ts", "bench/**"] },
  ...nextVitals,
  ...nextTs,
  {
    plugins: { cantrove: { rules: { "server-only-queries": serverOnlyQueries, "disable-with-reason": disableWithReason } } },
    rules: {
      "cantrove/disable-with-reason": "error",
      "import/no-cycle": ["error", { ignoreExternal: true }],
      "max-lines": ["error", { max: MAX_LINES, skipBlankLines: false, skipComments: false }],
      // Our own style (STYLE.md) where Next's set is silent or too loose.
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_", caughtErrors: "none" }],
    },
  },
  { files: ["lib/**/*queries*.ts"], rules: { "cantrove/server-only-queries": "error" } },
  layer(["lib/**"], ["@/app/*", "@/components/*", "@/hooks/*"], "lib/ is the bottom layer: it imports no pages, components or hooks."),
  layer(["hooks/**"], ["@/app/*", "@/components/*"], "Hooks sit under components: they import lib/ only."),
  layer(["components/**"], ["@/app/*"], "Components never import pages or route handlers."),
  {
    files: PURE.map((name) => `lib/**/${name.split("/")[1]}.ts`),
    rules: {
      "no-restricted-imports": [
        "error",
        { patterns: [...IMPURE, "@/app/*", "@/components/*", "@/hooks/*"].map((group) => ({ group: [group], message: "A computation is pure: no database, Next.js, session or request code." })) },
      ],
    },
  },
  ...ledgerRules,
  // The browser side talks to the API through lib/api/client.ts only (one error shape, one network message).
  {
    files: ["app/**/*.tsx", "components/**", "hooks/**"],
    rules: { "no-restricted-globals": ["error", { name: "fetch", message: "Use fetchJson / fetchJsonWithHeaders from @/lib/api/client." }] },
  },
  // Tests, migrations, seeds and scripts may be long (a table of cases, a schema) and reach any layer.
  { files: ["tests/**", "db/**", "scripts/**"], rules: { "max-lines": "off", "no-restricted-imports": "off" } },
];

export default config;
