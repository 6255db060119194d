'use client';

import { useState, type MouseEvent } from 'react';
import { SvgNodeView } from '@/components/lines/svg-node-view';
import { FormMessage } from '@/components/ui/form-message';
import { SelectField, TextField } from '@/components/ui/field';
import { buildTakeOffStrip, chainageAtPixel, STRIP } from '@/lib/chart/take-off-strip';
import type { NetworkView } from '@/lib/network/view';
import { usePlaceTakeOff } from '@/lib/queries/network';
import { formatQuantity, type UnitSystem } from '@/lib/units';

/** Pick a line, name the take-off, click its long profile where the tee goes. */
export function TakeOffPicker({ projectId, view, units }: { projectId: string; view: NetworkView; units: UnitSystem }) {
  const place = usePlaceTakeOff(projectId);
  const [lineId, setLineId] = useState(view.lines[0]?.id ?? '');
  const [name, setName] = useState('');
  const [done, setDone] = useState<string | null>(null);
  const line = view.lines.find((l) => l.id === lineId) ?? view.lines[0];
  if (!line) return null;
  const takeOffs = view.records.nodes
    .filter((n) => n.kind === 'junction' && n.lineId === line.id)
    .map((n) => ({ name: n.name, chainageM: n.chainageM ?? 0 }));

  function click(event: MouseEvent<HTMLDivElement>) {
    const svg = event.currentTarget.querySelector('svg');
    if (!svg) return;
    const box = svg.getBoundingClientRect();
    const xPixel = ((event.clientX - box.left) / box.width) * STRIP.width;
    const chainageM = Math.round(chainageAtPixel(line, xPixel) * 10) / 10;
    const label = name.trim() || `Take-off at ${formatQuantity('chainage', chainageM, units)}`;
    place.mutate(
      { lineId: line.id, chainageM, name: label },
      {
        onSuccess: () => {
          setDone(`Placed "${label}" at chainage ${formatQuantity('chainage', chainageM, units)}`);
          setName('');
        },
      },
    );
  }

  return (
    <div className="space-y-3">
      <div className="grid gap-3 sm:grid-cols-2">
        <SelectField id="take-off-line" label="Line" value={line.id} onChange={(e) => setLineId(e.target.value)}>
          {view.lines.map((l) => (
            <option key={l.id} value={l.id}>
              {l.name}
            </option>
          ))}
        </SelectField>
        <TextField
          id="take-off-name"
          label="Name of the take-off"
          value={name}
          onChange={(e) => setName(e.target.value)}
          hint="Then click the profile where the tee goes"
        />
      </div>
      <div
        className="cursor-crosshair overflow-hidden rounded-md border border-creek-100"
        onClick={click}
        data-testid="take-off-strip"
      >
        <SvgNodeView node={buildTakeOffStrip(line, takeOffs)} />
      </div>
      <FormMessage message={place.error ? place.error.message : done} tone={place.error ? 'error' : 'ok'} />
    </div>
  );
}
