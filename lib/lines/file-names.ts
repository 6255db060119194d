/** A safe download name from a line's name, e.g. `spring-box-to-house-rev-3.pdf`. */
export function reportFileName(lineName: string, revision: number, extension: 'pdf' | 'svg' | 'csv', suffix = ''): string {
  const slug = lineName.normalize('NFKD').replace(/[^\w\s-]/g, '').trim().toLowerCase().replace(/[\s_]+/g, '-').replace(/-+/g, '-').slice(0, 60) || 'line';
  return `${slug}${suffix ? `-${suffix}` : ''}-rev-${revision}.${extension}`;
}
