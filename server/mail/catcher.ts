import { randomUUID } from "node:crypto";
import { createWriteStream, mkdirSync } from "node:fs";
import { rename } from "node:fs/promises";
import { join } from "node:path";
import { pipeline } from "node:stream/promises";
import { SMTPServer } from "smtp-server";

export type MailCatcher = { url: string; port: number; dir: string; close: () => Promise<void> };

/**
 * The local stand-in for a mail service: a real SMTP server on loopback that accepts every message
 * and writes it, exactly as received, to `dir` as an .eml file (named by time, so a listing sorts
 * oldest first). `npm start`, `npm run dev` and the tests start one when SMTP_URL is not set.
 */
export function startMailCatcher(opts: { dir: string; port?: number; host?: string }): Promise<MailCatcher> {
  mkdirSync(opts.dir, { recursive: true });
  const host = opts.host ?? "127.0.0.1";
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS", "AUTH"],
    banner: "Shakeout Casebook local mail catcher",
    logger: false,
    async onData(stream, _session, callback) {
      const name = `${new Date().toISOString().replace(/[:.]/g, "-")}-${randomUUID().slice(0, 8)}.eml`;
      try {
        // Written under a temporary name, then renamed: a reader never sees half a message.
        const partial = join(opts.dir, `.${name}.part`);
        await pipeline(stream, createWriteStream(partial));
        await rename(partial, join(opts.dir, name));
        callback();
      } catch (err) {
        callback(err as Error);
      }
    },
  });
  return new Promise((resolve, reject) => {
    server.once("error", reject);
    server.listen(opts.port ?? 0, host, () => {
      const port = (server.server.address() as { port: number }).port;
      resolve({
        url: `smtp://${host}:${port}`,
        port,
        dir: opts.dir,
        close: () => new Promise<void>((r) => server.close(() => r())),
      });
    });
  });
}
