import { describe, expect, it } from 'vitest';
import { sniffSurveyFile } from '../../../lib/survey/sniff';
import { parseGpsCsv } from '../../../lib/survey/gps-csv';

describe('sniffSurveyFile', () => {
  it('returns UTF-8 text and strips a byte-order mark, saying it did', () => {
    const r = sniffSurveyFile(new Uint8Array([0xef, 0xbb, 0xbf, ...new TextEncoder().encode('lat,lon,ele\n')]));
    expect(r).toEqual({ text: 'lat,lon,ele\n', hadByteOrderMark: true });
  });
  it('falls back to Windows-1252 for older exports that are not valid UTF-8', () => {
    const latin = new Uint8Array([
      ...new TextEncoder().encode('name,lat,lon,ele\nSource '),
      0xe9,
      ...new TextEncoder().encode(',45.5,11.8,800\n'),
    ]);
    const r = sniffSurveyFile(latin);
    expect(r.text).toContain('Source é');
  });
  it('a size limit can be set lower, and is checked before content', () => {
    expect(() => sniffSurveyFile(new Uint8Array([0x89, 0x50, 0x4e, 0x47, 1, 2]), { maxBytes: 4 })).toThrow(/limit/);
  });
  it('sniffed text goes straight into a parser', () => {
    const { text } = sniffSurveyFile(
      new TextEncoder().encode('\ufefflat,lon,ele\r\n45.5,11.8,800\r\n45.6,11.9,790\r\n'),
    );
    expect(parseGpsCsv(text).points).toHaveLength(2);
  });
  it('reads a spreadsheet\'s "Unicode text" export (UTF-16 LE with a byte-order mark, tab separated) instead of refusing it as binary', () => {
    const text = 'lat\tlon\tele\r\n45.5\t11.8\t800\r\n45.6\t11.9\t790\r\n';
    const le = new Uint8Array(2 + text.length * 2);
    le.set([0xff, 0xfe]);
    for (let i = 0; i < text.length; i += 1) le.set([text.charCodeAt(i) & 0xff, text.charCodeAt(i) >> 8], 2 + i * 2);
    const r = sniffSurveyFile(le);
    expect(r).toEqual({ text, hadByteOrderMark: true });
    expect(parseGpsCsv(r.text).points).toHaveLength(2);
  });
  it('reads UTF-16 big-endian too, and still refuses NUL bytes without a byte-order mark', () => {
    const text = 'lat,lon,ele\n45.5,11.8,800\n';
    const be = new Uint8Array(2 + text.length * 2);
    be.set([0xfe, 0xff]);
    for (let i = 0; i < text.length; i += 1) be.set([text.charCodeAt(i) >> 8, text.charCodeAt(i) & 0xff], 2 + i * 2);
    expect(sniffSurveyFile(be).text).toBe(text);
    expect(() => sniffSurveyFile(be.slice(2))).toThrow(/NUL byte/);
  });
});
