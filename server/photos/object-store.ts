import type { Readable } from "node:stream";
import {
  DeleteObjectCommand,
  GetObjectCommand,
  HeadObjectCommand,
  ListObjectsCommand,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
} from "@aws-sdk/client-s3";
import { env, requireObjectStoreEndpoint } from "../env";
import { HttpError } from "../http/errors";

/**
 * Photos live in an S3-compatible object store (server/env.ts: S3_*), so every app server reads the
 * same ones. This file is the only one that speaks to it; a store that does not answer becomes a 503
 * with a plain message, never a 500.
 */
let client: S3Client | undefined;

function store(): S3Client {
  client ??= new S3Client({
    endpoint: requireObjectStoreEndpoint(),
    region: env.S3_REGION,
    forcePathStyle: env.S3_FORCE_PATH_STYLE,
    credentials:
      env.S3_ACCESS_KEY_ID && env.S3_SECRET_ACCESS_KEY
        ? { accessKeyId: env.S3_ACCESS_KEY_ID, secretAccessKey: env.S3_SECRET_ACCESS_KEY }
        : undefined,
    // Checksums only where the API demands them: not every S3-compatible store knows the newer headers.
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
    // A store that is away should be reported in seconds, not after the SDK's long default waits.
    maxAttempts: 2,
    requestHandler: { connectionTimeout: 2_000, requestTimeout: 15_000 },
  });
  return client;
}

export class StoreUnavailable extends HttpError {
  constructor(doing: string, cause: unknown) {
    super(503, `The photo store is not answering right now; ${doing}. Try again in a moment.`);
    this.cause = cause;
  }
}

const isMissing = (err: unknown) =>
  err instanceof S3ServiceException &&
  (err.name === "NoSuchKey" || err.name === "NotFound" || err.$metadata?.httpStatusCode === 404);

/** Anything but "no such object" is the store's trouble (down, refusing our keys, full): logged and 503. */
function unavailable(doing: string, err: unknown): StoreUnavailable {
  console.error(`Object store: ${doing}:`, err instanceof Error ? `${err.name}: ${err.message}` : err);
  return new StoreUnavailable(doing, err);
}

export async function putObject(key: string, body: Buffer, contentType: string) {
  try {
    await store().send(new PutObjectCommand({ Bucket: env.S3_BUCKET, Key: key, Body: body, ContentType: contentType }));
  } catch (err) {
    throw unavailable("nothing was saved", err);
  }
}

export type StoredObject = {
  body: Readable;
  length?: number;
  /** Set when a byte range was asked for and given: `bytes START-END/TOTAL`. */
  contentRange?: string;
};

/**
 * `range` must already be one well-formed `bytes=` range (server/photos/range.ts); one that starts
 * beyond the end is "unsatisfiable" (the store's 416).
 */
export async function getObject(key: string, range?: string): Promise<StoredObject | "missing" | "unsatisfiable"> {
  try {
    const out = await store().send(new GetObjectCommand({ Bucket: env.S3_BUCKET, Key: key, Range: range }));
    return { body: out.Body as Readable, length: out.ContentLength, contentRange: out.ContentRange };
  } catch (err) {
    if (isMissing(err)) return "missing";
    if (err instanceof S3ServiceException && err.$metadata?.httpStatusCode === 416) return "unsatisfiable";
    throw unavailable("the photo could not be read", err);
  }
}

/** A whole object in memory (a photo for the printed sheet); null when it is missing. */
export async function readObject(key: string): Promise<Buffer | null> {
  const got = await getObject(key);
  if (got === "missing" || got === "unsatisfiable") return null;
  const chunks: Buffer[] = [];
  for await (const chunk of got.body) chunks.push(Buffer.from(chunk as Uint8Array));
  return Buffer.concat(chunks);
}

export async function objectExists(key: string): Promise<boolean> {
  try {
    await store().send(new HeadObjectCommand({ Bucket: env.S3_BUCKET, Key: key }));
    return true;
  } catch (err) {
    if (isMissing(err)) return false;
    throw unavailable("the photo could not be checked", err);
  }
}

/** Best effort by design: callers use it to clean up, and a failure is logged, not thrown. */
export async function deleteObjects(keys: string[]): Promise<boolean> {
  try {
    // One by one: the batch call needs a Content-MD5 that some S3-compatible stores check differently.
    await Promise.all(keys.map((Key) => store().send(new DeleteObjectCommand({ Bucket: env.S3_BUCKET, Key }))));
    return true;
  } catch (err) {
    console.error(`Object store: could not remove ${keys.join(", ")}:`, err instanceof Error ? err.message : err);
    return false;
  }
}

export type ListedObject = { key: string; lastModified: Date };

/**
 * Every object of the bucket, one page (at most `pageSize` keys, in key order) at a time, so a bucket of
 * any size is walked in bounded memory. Each page starts after the last key of the one before
 * (ListObjects' `Marker`): ListObjectsV2's continuation tokens would do the same, but the local
 * stand-in (s3rver) makes them with DES, which Node 20's OpenSSL 3 refuses, so a second page there
 * fails. Every S3-compatible store pages by `Marker`.
 */
export async function* objectPages(pageSize = 1000): AsyncGenerator<ListedObject[]> {
  let marker: string | undefined;
  for (;;) {
    let page;
    try {
      page = await store().send(new ListObjectsCommand({ Bucket: env.S3_BUCKET, MaxKeys: pageSize, Marker: marker }));
    } catch (err) {
      throw unavailable("the photos could not be listed", err);
    }
    const objects = (page.Contents ?? [])
      .filter((o) => o.Key)
      .map((o) => ({ key: o.Key!, lastModified: o.LastModified ?? new Date() }));
    if (objects.length) yield objects;
    if (!page.IsTruncated || !objects.length) return;
    marker = objects[objects.length - 1].key;
  }
}
