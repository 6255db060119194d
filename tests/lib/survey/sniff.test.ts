import { describe, expect, it } from 'vitest';
import { sniffSurveyFile } from '../../../lib/survey/sniff';
import { parseGpsCsv } from '../../../lib/survey/gps-csv';

describe('sniffSurveyFile', () => {
  it('returns UTF-8 text and strips a byte-order mark, saying it did', () => {
    const r = sniffSurveyFile(new Uint8Array([0xef, 0xbb, 0xbf, ...new TextEncoder().encode('lat,lon,ele\n')]));
    expect(r).toEqual({ text: 'lat,lon,ele\n', hadByteOrderMark: true });
  });
  it('falls back to Windows-1252 for older exports that are not valid UTF-8', () => {
    const latin = new Uint8Array([...new TextEncoder().encode('name,lat,lon,ele\nSource '), 0xe9, ...new TextEncoder().encode(',45.5,11.8,800\n')]);
    const r = sniffSurveyFile(latin);
    expect(r.text).toContain('Source é');
  });
  it('a size limit can be set lower, and is checked before content', () => {
    expect(() => sniffSurveyFile(new Uint8Array([0x89, 0x50, 0x4e, 0x47, 1, 2]), { maxBytes: 4 })).toThrow(/limit/);
  });
  it('sniffed text goes straight into a parser', () => {
    const { text } = sniffSurveyFile(new TextEncoder().encode('\ufefflat,lon,ele\r\n45.5,11.8,800\r\n45.6,11.9,790\r\n'));
    expect(parseGpsCsv(text).points).toHaveLength(2);
  });
});
