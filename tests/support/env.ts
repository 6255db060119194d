// Integration tests talk to the test cluster `npm test` starts (scripts/test.sh sets these).
process.env.DATABASE_URL ??= 'postgres://runnel@127.0.0.1:5489/runnel_test';
process.env.NEXTAUTH_URL ??= 'http://127.0.0.1:3100';
// The fake object storage `npm test` starts (scripts/test.sh).
process.env.RUNNEL_S3_ENDPOINT ??= 'http://127.0.0.1:9402';
