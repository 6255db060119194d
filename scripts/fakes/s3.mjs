// Local stand-in for object storage: an S3-compatible server on loopback, data in a
// git-ignored folder. Port, folder and bucket come from the environment (scripts/start.sh and
// scripts/test.sh give `npm start` and `npm test` different ones).
import fs from 'node:fs';
import path from 'node:path';
import S3rver from 's3rver';

const port = Number(process.env.RUNNEL_S3_PORT ?? 9401);
const directory = path.resolve(process.env.RUNNEL_S3_DIR ?? '.runtime/s3');
const bucket = process.env.RUNNEL_S3_BUCKET ?? 'runnel-files';

fs.mkdirSync(directory, { recursive: true });
const server = new S3rver({
  address: '127.0.0.1',
  port,
  directory,
  silent: true,
  configureBuckets: [{ name: bucket, configs: [] }],
});
await server.run();
console.log(`[fake s3] http://127.0.0.1:${port} bucket ${bucket}, data in ${directory}`);

const stop = () => server.close().finally(() => process.exit(0));
process.on('SIGTERM', stop);
process.on('SIGINT', stop);
