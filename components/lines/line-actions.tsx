'use client';

import { useState } from 'react';
import { useConfirm } from '@/components/ui/confirm-dialog';
import { useDeleteLine, useDuplicateLine } from '@/lib/queries/lines';

/** What the delete dialog needs to say what goes. */
export interface LineToRemove {
  id: string;
  name: string;
  stretchCount: number;
  deviceCount: number;
}

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** The words of the delete dialog: the line, what goes with it, and what stays. */
export function LineDeletionWords({ line }: { line: LineToRemove }) {
  return (
    <>
      <p>
        The line <strong>{line.name}</strong> goes, with its{' '}
        {plural(line.stretchCount, 'pipe stretch', 'pipe stretches')}, {plural(line.deviceCount, 'device', 'devices')},
        fittings, custom pipes and settings.
      </p>
      <ul className="list-disc space-y-1 pl-5" data-testid="line-deletion-effects">
        <li>
          Its pipe leaves the network, with the network ends that only this line joined; take-offs placed on it go too,
          with the pipes joined to them.
        </li>
        <li>
          Stays: the survey route, tanks, sources, ram sites, outlets that have water uses, and review revisions already
          submitted (they keep their own copy).
        </li>
      </ul>
      <p>This cannot be undone. To keep a version, duplicate the line first.</p>
    </>
  );
}

/** Delete (asked first) and duplicate, for the lines list and the line page. */
export function useLineActions(projectId: string) {
  const confirm = useConfirm();
  const remove = useDeleteLine(projectId);
  const duplicate = useDuplicateLine(projectId);
  const [notice, setNotice] = useState<{ text: string; tone: 'ok' | 'error' } | null>(null);

  function askDelete(line: LineToRemove, after?: () => void) {
    confirm.ask({
      title: `Delete the line “${line.name}”?`,
      body: <LineDeletionWords line={line} />,
      confirmLabel: 'Delete line',
      onConfirm: async () => {
        await remove.mutateAsync(line.id);
        setNotice({ text: `Deleted “${line.name}”.`, tone: 'ok' });
        after?.();
      },
    });
  }

  async function copy(line: { id: string; name: string }) {
    setNotice(null);
    try {
      const made = await duplicate.mutateAsync({ lineId: line.id });
      setNotice({ text: `Copied “${line.name}” as “${made.name}”.`, tone: 'ok' });
      return made;
    } catch (error) {
      setNotice({ text: error instanceof Error ? `Not copied: ${error.message}` : 'Not copied.', tone: 'error' });
      return null;
    }
  }

  return { askDelete, copy, copying: duplicate.isPending, notice, dialog: confirm.dialog };
}
