// The object-storage half of `npm run backup` / `npm run restore`, through the app's own storage
// module (lib/storage.ts), so it works with the local fake and any S3-compatible service alike.
//   save <folder>: every object of the bucket into <folder>/objects/, listed in objects.json
//   load <folder>: every object listed back into the bucket; objects not in the backup are removed
import { createHash } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { deleteObject, getObject, listKeys, putObject } from '../lib/storage';

interface ManifestEntry {
  key: string;
  file: string;
  contentType: string;
  bytes: number;
  sha256: string;
}

const sha256 = (bytes: Uint8Array) => createHash('sha256').update(bytes).digest('hex');

/** Some S3-compatible stores answer a read of a key deleted after the listing with a server error,
 *  not "no such key": a read that fails is skipped only when the key is gone from a new listing. */
async function readIfStillThere(key: string): ReturnType<typeof getObject> {
  try {
    return await getObject(key);
  } catch (error) {
    if (!(await listKeys(key)).includes(key)) return null;
    throw error;
  }
}

async function save(folder: string): Promise<void> {
  const dir = path.join(folder, 'objects');
  fs.mkdirSync(dir, { recursive: true, mode: 0o700 });
  const entries: ManifestEntry[] = [];
  for (const key of await listKeys('')) {
    const object = await readIfStillThere(key);
    // Deleted between the listing and the read: a live store changes while it is copied.
    if (!object) continue;
    const file = `${String(entries.length + 1).padStart(6, '0')}.bin`;
    fs.writeFileSync(path.join(dir, file), object.bytes, { mode: 0o600 });
    entries.push({ key, file, contentType: object.contentType, bytes: object.bytes.byteLength, sha256: sha256(object.bytes) });
  }
  fs.writeFileSync(path.join(folder, 'objects.json'), `${JSON.stringify(entries, null, 1)}\n`, { mode: 0o600 });
  console.log(`[runnel] ${entries.length} objects saved`);
}

async function load(folder: string): Promise<void> {
  const manifestFile = path.join(folder, 'objects.json');
  if (!fs.existsSync(manifestFile)) throw new Error(`${manifestFile} is missing: not a Runnel backup folder`);
  const entries = JSON.parse(fs.readFileSync(manifestFile, 'utf8')) as ManifestEntry[];
  for (const entry of entries) {
    const bytes = fs.readFileSync(path.join(folder, 'objects', entry.file));
    if (sha256(bytes) !== entry.sha256) throw new Error(`objects/${entry.file} (${entry.key}) does not match its checksum in objects.json; nothing more restored`);
    await putObject(entry.key, bytes, entry.contentType);
  }
  const kept = new Set(entries.map((e) => e.key));
  let removed = 0;
  for (const key of await listKeys('')) {
    if (!kept.has(key)) {
      await deleteObject(key);
      removed++;
    }
  }
  console.log(`[runnel] ${entries.length} objects restored, ${removed} not in the backup removed`);
}

const [command, folder] = process.argv.slice(2);
if ((command !== 'save' && command !== 'load') || !folder) {
  console.error('usage: backup-objects.ts save|load <backup folder>');
  process.exit(2);
}
(command === 'save' ? save(folder) : load(folder)).catch((error) => {
  console.error(`[runnel] object storage: ${(error as Error).message}`);
  process.exit(1);
});
