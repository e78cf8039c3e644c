import { spawnSync } from "node:child_process";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";

const root = fileURLToPath(new URL("../..", import.meta.url));
const run = (input: string) =>
  spawnSync("npx", ["tsx", "scripts/diagnose.ts"], { cwd: root, input, encoding: "utf8", timeout: 60_000 });

describe("npm run diagnose", () => {
  it("reads a case on stdin and prints only the result JSON", () => {
    // Misrun poured 40 °C below the green-sand window (about 700-760 °C [mem], foundry-facts.md): cold pour.
    const out = run(
      JSON.stringify({
        defects: [{ type: "misrun", location: "far-from-gate", severity: 2 }],
        alloy: "A356",
        process: "green-sand",
        pourTempC: 660,
      }),
    );
    expect(out.status).toBe(0);
    const result = JSON.parse(out.stdout);
    expect(Object.keys(result).sort()).toEqual(["causes", "cautionTemplates", "cautions", "facts", "missing", "notes"]);
    expect(result.causes[0]).toMatchObject({
      id: "cold-pour",
      because: ["Poured at 660 °C, 40 °C below the usual 700-760 °C for green sand"],
    });
    expect(result.facts.superheatC).toBe(45);
    // The SI sentences carry no template braces; the templates keep them for the app to convert.
    expect(result.causes[0].fixes.join(" ")).toMatch(/by 20-30 °C and/);
    expect(result.causes[0].fixTemplates.join(" ")).toMatch(/by \{20-30 K\} and/);
  }, 60_000);

  it("refuses a bad case on stderr with exit code 2 and nothing on stdout", () => {
    const out = run(JSON.stringify({ defects: [{ type: "bubbles" }], alloy: "A356", process: "sand" }));
    expect(out.status).toBe(2);
    expect(out.stdout).toBe("");
    const err = JSON.parse(out.stderr);
    expect(err.error).toMatch(/not valid/);
    expect(err.issues.map((i: { path: string }) => i.path)).toEqual(
      expect.arrayContaining(["defects.0.type", "process"]),
    );
  }, 60_000);

  it("refuses input that is not JSON; an unknown alloy is diagnosed by its family with a note", () => {
    expect(run("misrun please").status).toBe(2);
    const out = run(
      JSON.stringify({ defects: [{ type: "misrun" }], alloy: "Z9", process: "green-sand", pourTempC: 1120 }),
    );
    expect(out.status).toBe(0);
    const result = JSON.parse(out.stdout);
    expect(result.notes[0]).toMatch(
      /"Z9" is not in the alloy table: the temperatures logged place it in the copper-base family/,
    );
    expect(result.causes.length).toBeGreaterThan(0);
  }, 60_000);
});
