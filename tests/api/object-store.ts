import {
  BucketAlreadyOwnedByYou,
  CreateBucketCommand,
  DeleteObjectCommand,
  ListObjectsV2Command,
  S3Client,
} from "@aws-sdk/client-s3";
import { env } from "../../server/env";

/** Each test file's own bucket on the run's one store (tests/api/setup.ts); buckets are made path-style. */
export async function createBucket(
  endpoint: string,
  bucket: string,
  credentials: { accessKeyId: string; secretAccessKey: string },
) {
  const client = new S3Client({ endpoint, region: "us-east-1", forcePathStyle: true, credentials });
  try {
    await client.send(new CreateBucketCommand({ Bucket: bucket }));
  } catch (err) {
    if (!(err instanceof BucketAlreadyOwnedByYou)) throw err;
  } finally {
    client.destroy();
  }
}

/** A client of the test file's own bucket, apart from the server's, to look at what it stored. */
const s3 = () =>
  new S3Client({
    endpoint: env.S3_ENDPOINT,
    region: env.S3_REGION,
    forcePathStyle: true,
    credentials: { accessKeyId: env.S3_ACCESS_KEY_ID!, secretAccessKey: env.S3_SECRET_ACCESS_KEY! },
  });

export async function storedKeys(): Promise<string[]> {
  const client = s3();
  const keys: string[] = [];
  let token: string | undefined;
  do {
    const page = await client.send(new ListObjectsV2Command({ Bucket: env.S3_BUCKET, ContinuationToken: token }));
    keys.push(...(page.Contents ?? []).map((o) => o.Key!));
    token = page.NextContinuationToken;
  } while (token);
  client.destroy();
  return keys.sort();
}

export async function removeObject(key: string) {
  const client = s3();
  await client.send(new DeleteObjectCommand({ Bucket: env.S3_BUCKET, Key: key }));
  client.destroy();
}
