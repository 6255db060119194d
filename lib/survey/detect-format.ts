/** GPX when the text is XML with a <gpx> root; otherwise a CSV of some kind. */
export function looksLikeGpx(text: string): boolean {
  const head = text.slice(0, 2048).trimStart();
  return /^<\?xml/i.test(head)
    ? /<(?:[\w.-]+:)?gpx[\s>]/.test(text.slice(0, 65536))
    : /^<(?:[\w.-]+:)?gpx[\s>]/.test(head);
}
