import { ScrollFrame } from '@/components/ui/table-frame';
export interface SampleTableProps {
  headers: string[];
  rows: string[][];
  /** Column index → what it was mapped to (shown above the header). */
  roles: Record<number, string>;
}

/** The first rows of the file under its headers, with the chosen meaning of each column. */
export function SampleTable({ headers, rows, roles }: SampleTableProps) {
  return (
    <ScrollFrame label="First rows of the file" dense>
      <table className="w-full text-left text-xs" aria-label="First rows of the file">
        <thead className="bg-creek-50 text-creek-800">
          <tr>
            {headers.map((h, i) => (
              <th key={i} scope="col" className="px-2 py-1.5 align-bottom font-medium">
                <span
                  className={`block text-[10px] uppercase tracking-wide ${roles[i] ? 'text-moss-700' : 'text-creek-400'}`}
                >
                  {roles[i] ?? 'not used'}
                </span>
                {h}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((r, k) => (
            <tr key={k} className="border-t border-creek-50">
              {headers.map((_, i) => (
                <td key={i} className={`tabular px-2 py-1 ${roles[i] ? 'text-creek-950' : 'text-creek-400'}`}>
                  {r[i] ?? ''}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollFrame>
  );
}
