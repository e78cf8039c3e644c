/**
 * `tsx scripts/cpu-profile-summary.ts FILE.cpuprofile [--top=30]`: where a profiled server spent its
 * time (BENCH_CPU_PROF in bench-harness.ts writes the profile). Prints the functions with the most
 * self time, and self time summed by package or source folder, each as a share of the busy time
 * (idle and the garbage collector shown apart). Reads V8's .cpuprofile JSON; needs nothing else.
 */
import { readFileSync } from "node:fs";

type Node = {
  id: number;
  callFrame: { functionName: string; url: string; lineNumber: number };
  children?: number[];
};
type Profile = { nodes: Node[]; samples: number[]; timeDeltas: number[] };

const file = process.argv[2];
if (!file) throw new Error("usage: tsx scripts/cpu-profile-summary.ts FILE.cpuprofile [--top=30]");
const top = Number(process.argv.find((a) => a.startsWith("--top="))?.split("=")[1] ?? 30);
const profile = JSON.parse(readFileSync(file, "utf8")) as Profile;
const byId = new Map(profile.nodes.map((n) => [n.id, n]));

const selfUs = new Map<number, number>();
profile.samples.forEach((id, i) => selfUs.set(id, (selfUs.get(id) ?? 0) + (profile.timeDeltas[i] ?? 0)));

/** node_modules/<package> or the product's own folder (server/auth, lib...). */
function placeOf(url: string): string {
  if (!url) return "(native)";
  const mod = /node_modules\/((?:@[^/]+\/)?[^/]+)/.exec(url);
  if (mod) return mod[1];
  if (url.startsWith("node:")) return "node internals";
  const own = /\/(server|lib|db|rules|scripts)\/([^/]+\/)?/.exec(url);
  return own ? own[0].slice(1, -1) : url;
}

const fns = new Map<string, number>();
const places = new Map<string, number>();
let busy = 0;
let idle = 0;
let gc = 0;
for (const [id, us] of selfUs) {
  const { functionName, url, lineNumber } = byId.get(id)!.callFrame;
  if (functionName === "(idle)") idle += us;
  else if (functionName === "(garbage collector)") gc += us;
  if (functionName === "(idle)") continue;
  busy += us;
  const name = `${functionName || "(anonymous)"}  ${url.replace(/^.*node_modules\//, "").replace(/^file:\/\/.*?\/(server|lib|db|rules|scripts)\//, "$1/")}:${lineNumber + 1}`;
  fns.set(name, (fns.get(name) ?? 0) + us);
  places.set(placeOf(url), (places.get(placeOf(url)) ?? 0) + us);
}

const share = (us: number) =>
  `${((100 * us) / busy).toFixed(1).padStart(5)} %  ${(us / 1000).toFixed(0).padStart(7)} ms`;
const sorted = (m: Map<string, number>) => [...m].sort((a, b) => b[1] - a[1]).slice(0, top);
console.log(
  `busy ${(busy / 1000).toFixed(0)} ms (of which garbage collector ${share(gc)}), idle ${(idle / 1000).toFixed(0)} ms`,
);
console.log("\nself time by package or folder:");
for (const [k, us] of sorted(places)) console.log(`${share(us)}  ${k}`);
console.log("\nself time by function:");
for (const [k, us] of sorted(fns)) console.log(`${share(us)}  ${k}`);
