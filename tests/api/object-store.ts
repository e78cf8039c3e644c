import { DeleteObjectCommand, ListObjectsV2Command, S3Client } from "@aws-sdk/client-s3";
import { env } from "../../server/env";

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
