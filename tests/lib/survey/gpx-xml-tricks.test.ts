import { describe, it } from 'vitest';
import { parseGpx } from '../../../lib/survey/gpx';
import { expectImportError } from './expect-import-error';

const HEAD = '<?xml version="1.0"?>';
const gpx = (inner: string, head = HEAD) =>
  `${head}<gpx version="1.1" creator="x" xmlns="http://www.topografix.com/GPX/1/1"><trk><trkseg>${inner}</trkseg></trk></gpx>`;

describe('GPX files with XML tricks are refused as the import’s own error, nothing expanded or fetched', () => {
  it.each([
    [
      'nested entities (billion laughs)',
      gpx(
        '<trkpt lat="54" lon="-2"><ele>&b;</ele></trkpt>',
        `${HEAD}<!DOCTYPE gpx [<!ENTITY a "aaaaaaaaaa"><!ENTITY b "&a;&a;&a;&a;&a;&a;&a;&a;&a;&a;">]>`,
      ),
    ],
    [
      'an external entity',
      gpx(
        '<trkpt lat="54" lon="-2"><name>&x;</name></trkpt>',
        `${HEAD}<!DOCTYPE gpx [<!ENTITY x SYSTEM "file:///etc/passwd">]>`,
      ),
    ],
    [
      'a parameter entity',
      gpx('<trkpt lat="54" lon="-2"/>', `${HEAD}<!DOCTYPE gpx [<!ENTITY % p "<!ENTITY x 'y'>"> %p;]>`),
    ],
    ['100,000 nested elements', gpx(`${'<extensions>'.repeat(100_000)}${'</extensions>'.repeat(100_000)}`)],
  ])('%s', (_name, text) => {
    expectImportError(() => parseGpx(text), { code: 'broken-xml' });
  });
});
