import { Router, type RequestHandler } from "express";
import multer from "multer";
import { allow, currentMember, requireShopMember } from "../auth/shop-access";
import { HttpError } from "../http/errors";
import { MAX_IMPORT_BYTES } from "./parse";
import { previewImport, runImport } from "./service";

export const importRouter = Router();

/** In memory, one file and the mapping beside it; a larger file stops being read at the limit. */
const receive = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: MAX_IMPORT_BYTES, files: 1, fields: 2, fieldSize: 64 * 1024, parts: 3 },
}).single("file");

const receiveFile: RequestHandler = (req, res, next) =>
  receive(req, res, (err: unknown) => {
    if (!err) return next();
    if (err instanceof multer.MulterError && err.code === "LIMIT_FILE_SIZE") {
      const message = "The file is larger than 2 MB; split the log into years.";
      return next(new HttpError(400, message, { file: message }));
    }
    const message = err instanceof Error ? err.message : "The upload could not be read.";
    next(new HttpError(400, `The upload could not be read: ${message}`, { file: message }));
  });

/** The file and, when the owner has set one, the column mapping (JSON in the `mapping` field). */
function upload(req: Parameters<RequestHandler>[0]) {
  if (!req.file) throw new HttpError(400, "No file was sent.", { file: "choose a CSV file" });
  const raw = (req.body as Record<string, unknown> | undefined)?.mapping;
  if (raw === undefined || raw === "") return { bytes: req.file.buffer, mapping: undefined };
  try {
    return { bytes: req.file.buffer, mapping: JSON.parse(String(raw)) as unknown };
  } catch {
    throw new HttpError(400, "The column mapping could not be read.", { mapping: "must be JSON" });
  }
}

// Bringing in a whole log rewrites the shop's record, so it is the owner's, like the export.
const owner = [requireShopMember, allow({ shop: ["import"] }), receiveFile];

/** What would be imported and what refused, row by row; stores nothing. */
importRouter.post("/preview", ...owner, async (req, res) => {
  const { bytes, mapping } = upload(req);
  res.json(await previewImport(currentMember(req).shopId, bytes, mapping));
});

/** The rows that pass, in one transaction; rows imported before (same fingerprint) are skipped. */
importRouter.post("/", ...owner, async (req, res) => {
  const { bytes, mapping } = upload(req);
  if (mapping === undefined) throw new HttpError(400, "Map the file's columns first.", { mapping: "required" });
  res.status(201).json(await runImport(currentMember(req), bytes, mapping));
});
