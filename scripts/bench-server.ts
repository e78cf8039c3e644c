/**
 * The server as the benchmarks run it in a child process of its own (scripts/bench-harness.ts,
 * bench-search.ts), so the resident memory read from /proc is the server's alone and a load
 * generator in the parent does not share its event loop. Configuration comes from the parent's
 * environment. Beside the app it serves the previous design's offset-paged lists at
 * /api/bench-previous (bench-previous-lists.ts), for bench-load to compare.
 */
import express from "express";

const { createApp } = await import("../server/app");
const { previousLists } = await import("./bench-previous-lists");
const { warmUp } = await import("../server/warm-up");
const outer = express();
outer.use("/api/bench-previous", previousLists());
outer.use(createApp());
// A clean exit on SIGTERM, so `--cpu-prof` (BENCH_CPU_PROF in bench-harness.ts) writes its profile.
process.on("SIGTERM", () => process.exit(0));
// Warmed as server/index.ts warms every server before it listens.
await warmUp();
outer.listen(Number(process.env.PORT), "127.0.0.1", () => console.log("listening"));
