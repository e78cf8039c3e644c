import { once } from "node:events";
import { get, type ClientRequest, type IncomingHttpHeaders } from "node:http";
import type { AddressInfo } from "node:net";
import { gunzipSync } from "node:zlib";
import { beforeAll, describe, expect, it } from "vitest";
import { app, migrateOnce, shopWithCrew } from "./helpers";
import { newCasting, newMelt } from "./notebook-fixtures";

beforeAll(migrateOnce);

describe("compressed API answers", () => {
  it("sends a long list gzip- or brotli-compressed to a browser that accepts it, the same list otherwise", async () => {
    const { caster } = await shopWithCrew("Compression Shop");
    for (let i = 0; i < 8; i++) {
      const melt = await newMelt(caster, { notes: `Heat ${i}: ladle preheated, skimmed twice before the pour` });
      await newCasting(caster, melt.id);
    }

    const plain = await caster.agent.get("/api/melts").set("Accept-Encoding", "identity");
    expect(plain.status).toBe(200);
    expect(plain.headers["content-encoding"]).toBeUndefined();
    const plainBytes = Buffer.byteLength(plain.text);
    expect(plainBytes).toBeGreaterThan(1024); // over the threshold below which nothing is compressed

    const br = await caster.agent.get("/api/melts").set("Accept-Encoding", "br, gzip");
    expect(br.headers["content-encoding"]).toBe("br");
    expect(br.headers["vary"]).toMatch(/Accept-Encoding/i);
    expect(br.body).toEqual(plain.body); // supertest decodes it: the same answer arrives

    // The bytes on the wire, read by a client that does not decode them: a fraction of the plain answer.
    const cookie = String((plain as unknown as { req: ClientRequest }).req.getHeader("cookie"));
    const server = app.listen(0, "127.0.0.1");
    await once(server, "listening");
    try {
      const { port } = server.address() as AddressInfo;
      const wire = await rawGet(`http://127.0.0.1:${port}/api/melts`, { cookie, "accept-encoding": "gzip" });
      expect(wire.headers["content-encoding"]).toBe("gzip");
      expect(wire.headers["cache-control"]).toBe("no-store");
      expect(wire.body.length).toBeLessThan(plainBytes / 3);
      expect(JSON.parse(gunzipSync(wire.body).toString())).toEqual(plain.body);
    } finally {
      server.close();
    }
  });
});

/** node:http leaves the body as it came: no decoding, unlike supertest and fetch. */
function rawGet(url: string, headers: Record<string, string>) {
  return new Promise<{ headers: IncomingHttpHeaders; body: Buffer }>((resolve, reject) => {
    get(url, { headers }, (res) => {
      const parts: Buffer[] = [];
      res.on("data", (part: Buffer) => parts.push(part));
      res.on("end", () => resolve({ headers: res.headers, body: Buffer.concat(parts) }));
    }).on("error", reject);
  });
}
