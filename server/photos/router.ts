import { pipeline } from "node:stream/promises";
import { Router, type RequestHandler } from "express";
import multer from "multer";
import { allow, currentMember, requireShopMember } from "../auth/shop-access";
import { castingInShop } from "../castings/lookup";
import { HttpError } from "../http/errors";
import { idParam } from "../notebook/shared";
import { getObject } from "./object-store";
import { singleByteRange } from "./range";
import { deletePhoto, MAX_PHOTO_BYTES, photoInShop, storePhoto } from "./service";

export const photosRouter = Router();

/** In memory: an aborted or refused upload never touches the disk. One file, no stray fields. */
const receive = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: MAX_PHOTO_BYTES, files: 1, fields: 5, parts: 6 },
}).single("photo");

/** multer's errors in the API's one error shape: too large is 413, the rest is bad input. */
const receivePhoto: RequestHandler = (req, res, next) =>
  receive(req, res, (err: unknown) => {
    if (!err) return next();
    if (err instanceof multer.MulterError && err.code === "LIMIT_FILE_SIZE") {
      return next(new HttpError(413, "The photo is larger than 15 MB.", { photo: "at most 15 MB" }));
    }
    const message = err instanceof Error ? err.message : "The upload could not be read.";
    next(new HttpError(400, `The upload could not be read: ${message}`, { photo: message }));
  });

photosRouter.post(
  "/castings/:id",
  requireShopMember,
  allow({ casebook: ["write"] }),
  // Before reading up to 15 MB: is there such a casting in this shop?
  async (req, _res, next) => {
    await castingInShop(currentMember(req).shopId, idParam(req.params.id, "No such casting"));
    next();
  },
  receivePhoto,
  async (req, res) => {
    if (!req.file) throw new HttpError(400, "No photo was sent.", { photo: "choose a photo" });
    let gone = false;
    res.on("close", () => (gone = !res.writableFinished));
    const photo = await storePhoto(currentMember(req), Number(req.params.id), req.file.buffer, () => gone);
    res.status(201).json(photo);
  },
);

/** Streamed from the object store after the shop check; one byte range is honoured (a phone's viewer asks). */
const serve =
  (which: "fileName" | "thumbName"): RequestHandler =>
  async (req, res) => {
    const row = await photoInShop(currentMember(req).shopId, idParam(req.params.id, "No such photo"));
    const object = await getObject(row[which], singleByteRange(req.headers.range));
    if (object === "missing") {
      console.error(`Photo ${row.id}: object ${row[which]} is missing from the store.`);
      throw new HttpError(404, "This photo's file is missing from the photo store.");
    }
    if (object === "unsatisfiable") throw new HttpError(416, "That byte range lies beyond the end of the photo.");
    res.status(object.contentRange ? 206 : 200).set({
      "Content-Type": "image/jpeg",
      "Cache-Control": "private, max-age=86400",
      "X-Content-Type-Options": "nosniff",
      "Accept-Ranges": "bytes",
      ...(object.length !== undefined && { "Content-Length": String(object.length) }),
      ...(object.contentRange && { "Content-Range": object.contentRange }),
    });
    // A store that fails mid-photo, or a client that leaves, ends the response; either way the stream is closed.
    await pipeline(object.body, res).catch((err: NodeJS.ErrnoException) => {
      if (err.code !== "ERR_STREAM_PREMATURE_CLOSE") console.error(`Photo ${row.id}: stream broke off:`, err.message);
    });
  };
photosRouter.get("/:id/image", requireShopMember, allow({ casebook: ["read"] }), serve("fileName"));
photosRouter.get("/:id/thumb", requireShopMember, allow({ casebook: ["read"] }), serve("thumbName"));

photosRouter.delete("/:id", requireShopMember, allow({ casebook: ["write"] }), async (req, res) => {
  await deletePhoto(currentMember(req), idParam(req.params.id, "No such photo"));
  res.status(204).end();
});
