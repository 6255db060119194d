/** A safe download name from a line's name, e.g. `spring-box-to-house-rev-3.pdf`; `null` = the working copy. */
export function reportFileName(
  lineName: string,
  revision: number | null,
  extension: 'pdf' | 'svg' | 'csv',
  suffix = '',
): string {
  const slug =
    lineName
      .normalize('NFKD')
      .replace(/[^\w\s-]/g, '')
      .trim()
      .toLowerCase()
      .replace(/[\s_]+/g, '-')
      .replace(/-+/g, '-')
      .slice(0, 60) || 'line';
  return `${slug}${suffix ? `-${suffix}` : ''}-${revision === null ? 'working-copy' : `rev-${revision}`}.${extension}`;
}
