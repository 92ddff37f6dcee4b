import "server-only";
import { DeleteObjectCommand, GetObjectCommand, PutObjectCommand, S3Client } from "@aws-sdk/client-s3";

let client: S3Client | undefined;

function s3(): S3Client {
  client ??= new S3Client({
    region: process.env.S3_REGION ?? "us-east-1",
    endpoint: process.env.S3_ENDPOINT,
    forcePathStyle: true,
    credentials: { accessKeyId: process.env.S3_ACCESS_KEY_ID ?? "S3RVER", secretAccessKey: process.env.S3_SECRET_ACCESS_KEY ?? "S3RVER" },
    // The default checksums break on S3-compatible fakes.
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
  });
  return client;
}

const bucket = () => process.env.S3_BUCKET ?? "trainyard-uploads";

export async function putObject({ key, body, contentType }: { key: string; body: Uint8Array; contentType: string }) {
  await s3().send(new PutObjectCommand({ Bucket: bucket(), Key: key, Body: body, ContentType: contentType }));
}

export async function getObjectBytes({ key }: { key: string }): Promise<Uint8Array> {
  const out = await s3().send(new GetObjectCommand({ Bucket: bucket(), Key: key }));
  return out.Body!.transformToByteArray();
}

export async function deleteObject({ key }: { key: string }) {
  await s3().send(new DeleteObjectCommand({ Bucket: bucket(), Key: key }));
}
