/**
 * The server as `npm run bench:search` runs it: a child process of its own, so the resident memory
 * the bench reads from /proc is the server's alone. Configuration comes from the parent's environment.
 */
const { listen } = await import("../server/index");
await listen({ port: Number(process.env.PORT), host: "127.0.0.1" });
console.log("listening");
