// `npm run db:check`: the migrations under drizzle/ are consistent (drizzle-kit check) and agree with
// db/schema.ts: drizzle-kit generate, run against a copy of drizzle/, must find nothing to write.
// drizzle-kit 0.31 has no dry run for generate, hence the copy. Needs no database.
import { spawnSync } from "node:child_process";
import { cpSync, mkdirSync, mkdtempSync, readdirSync, rmSync, writeFileSync } from "node:fs";
import { join, relative } from "node:path";
import { fileURLToPath } from "node:url";

const root = fileURLToPath(new URL("..", import.meta.url));
const kit = join(root, "node_modules", ".bin", "drizzle-kit");
// drizzle-kit can print an error and still exit 0, so its output is read too.
function run(args: string[]): boolean {
  const r = spawnSync(kit, args, { cwd: root, encoding: "utf8" });
  process.stdout.write(r.stdout);
  process.stderr.write(r.stderr);
  return r.status === 0 && !/\bError\b/.test(r.stdout + r.stderr);
}

if (!run(["check"])) process.exit(1);

// drizzle-kit wants a path relative to the project for `out`: the scratch copy lives in node_modules/.cache.
mkdirSync(join(root, "node_modules", ".cache"), { recursive: true });
const scratch = mkdtempSync(join(root, "node_modules", ".cache", "db-check-"));
try {
  const out = join(scratch, "drizzle");
  cpSync(join(root, "drizzle"), out, { recursive: true });
  const config = join(scratch, "drizzle.config.json");
  writeFileSync(
    config,
    JSON.stringify({ dialect: "postgresql", schema: "./db/schema.ts", out: `./${relative(root, out)}` }),
  );
  const before = readdirSync(out).length;
  if (!run(["generate", "--config", config])) process.exit(1);
  if (readdirSync(out).length !== before) {
    console.error("db/schema.ts differs from the migrations: run  npm run db:generate -- --name <what changed>");
    process.exit(1);
  }
  console.log("The schema and the migrations agree.");
} finally {
  rmSync(scratch, { recursive: true, force: true });
}
