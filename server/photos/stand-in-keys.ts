/**
 * s3rver accepts these fixed keys and checks the signature made with them. Apart from
 * store-stand-in.ts so that reading them does not load s3rver (most of a second).
 */
export const STAND_IN_KEYS = { accessKeyId: "S3RVER", secretAccessKey: "S3RVER" } as const;
