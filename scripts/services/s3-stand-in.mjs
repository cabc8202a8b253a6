// Local S3-compatible stand-in for uploads. The app talks to it only through @aws-sdk/client-s3, so a
// hosted bucket is a change of S3_ENDPOINT and keys.
import S3rver from "s3rver";
import fs from "node:fs";
import path from "node:path";

const port = Number(process.env.S3_PORT ?? 4569);
const directory = path.resolve(process.env.S3_DATA_DIR ?? ".s3data");
const buckets = (process.env.S3_BUCKETS ?? `${process.env.S3_BUCKET ?? "sagline-uploads"},sagline-test`).split(",");
fs.mkdirSync(directory, { recursive: true });

const server = new S3rver({
  port,
  address: "127.0.0.1",
  directory,
  silent: true,
  configureBuckets: buckets.map((name) => ({ name: name.trim() })),
});
server.run().then(
  () => console.log(`S3 stand-in listening on 127.0.0.1:${port}, storing in ${directory}`),
  (err) => {
    console.error(`S3 stand-in: ${err.message}`);
    process.exit(1);
  },
);
for (const sig of ["SIGTERM", "SIGINT"]) process.on(sig, () => server.close().then(() => process.exit(0)));
