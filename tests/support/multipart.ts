/** One field of a multipart/form-data body; a file when `fileName` is given. */
export interface FormPart {
  name: string;
  value: string | Uint8Array;
  fileName?: string;
  contentType?: string;
}

/** Builds a multipart/form-data body by hand, as a browser would send a file upload. */
export function multipartBody(parts: readonly FormPart[]): { body: Uint8Array; contentType: string } {
  const boundary = `----runnel-test-${Math.random().toString(16).slice(2)}`;
  const enc = new TextEncoder();
  const chunks: Uint8Array[] = [];
  for (const p of parts) {
    const disposition =
      p.fileName === undefined
        ? `form-data; name="${p.name}"`
        : `form-data; name="${p.name}"; filename="${p.fileName}"`;
    const type = p.fileName === undefined ? '' : `Content-Type: ${p.contentType ?? 'application/octet-stream'}\r\n`;
    chunks.push(enc.encode(`--${boundary}\r\nContent-Disposition: ${disposition}\r\n${type}\r\n`));
    chunks.push(typeof p.value === 'string' ? enc.encode(p.value) : p.value);
    chunks.push(enc.encode('\r\n'));
  }
  chunks.push(enc.encode(`--${boundary}--\r\n`));
  const body = new Uint8Array(chunks.reduce((n, c) => n + c.byteLength, 0));
  let at = 0;
  for (const c of chunks) {
    body.set(c, at);
    at += c.byteLength;
  }
  return { body, contentType: `multipart/form-data; boundary=${boundary}` };
}

/** A survey upload: the file and the import options, as the import screen sends them. */
export function surveyUpload(
  fileName: string,
  content: string | Uint8Array,
  options: unknown,
): { body: Uint8Array; contentType: string } {
  return multipartBody([
    {
      name: 'file',
      value: content,
      fileName,
      contentType: fileName.endsWith('.gpx') ? 'application/gpx+xml' : 'text/csv',
    },
    { name: 'options', value: JSON.stringify(options) },
  ]);
}
