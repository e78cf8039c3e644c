import type { Server } from "node:http";
import { createApp } from "./app";

/** Starts the one Express process: API under /api, the web app from `webDir`. */
export function listen(opts: { port: number; host: string; webDir?: string }): Promise<Server> {
  const app = createApp({ webDir: opts.webDir });
  return new Promise((resolve, reject) => {
    const server = app.listen(opts.port, opts.host, () => resolve(server));
    server.on("error", reject);
  });
}
