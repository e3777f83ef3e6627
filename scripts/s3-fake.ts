// A local S3 fake on loopback for `npm start`/tests when STORAGE_ENGINE=s3 (credentials S3RVER/S3RVER).
import os from "node:os";
import path from "node:path";
import S3rver from "s3rver";

const port = Number(process.env.S3_PORT ?? 4569);
const bucket = process.env.S3_BUCKET ?? "swarfbook-uploads";
const directory = process.env.S3_FAKE_DIR ?? path.join(os.tmpdir(), "swarfbook-s3rver");

const server = new S3rver({ address: "127.0.0.1", port, silent: true, directory, configureBuckets: [{ name: bucket }] });
const address = await server.run();
console.log(`[s3-fake] listening on http://127.0.0.1:${address.port}, bucket ${bucket}, files in ${directory}`);

const stop = () => void server.close().then(() => process.exit(0));
process.on("SIGINT", stop);
process.on("SIGTERM", stop);
