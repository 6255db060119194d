'use client';

import { Axis, Grid, LineSeries, Tooltip, XYChart } from '@visx/xychart';
import { useEffect, useState } from 'react';
import { formatNumber, toDisplay, unitOf, type UnitSystem } from '@/lib/units';

interface Point { hour: number; volume: number }

const COLOURS: Record<string, string> = { 'Supply, cumulative': '#2d7590', 'Demand, cumulative': '#b9462f', 'Water in the tank': '#48702b' };
const colourOf = (key: string) => COLOURS[key];

function series(valuesM3: readonly number[], units: UnitSystem): Point[] {
  return valuesM3.map((volumeM3, hour) => ({ hour, volume: toDisplay('volume', volumeM3, units) }));
}

/** Width of a box, measured now and on every resize (the chart is drawn only once it is known). */
function useBoxWidth() {
  const [node, setNode] = useState<HTMLDivElement | null>(null);
  const [width, setWidth] = useState(0);
  useEffect(() => {
    if (!node) return;
    const observer = new ResizeObserver(([entry]) => setWidth(entry.contentRect.width));
    observer.observe(node);
    return () => observer.disconnect();
  }, [node]);
  return [setNode, width] as const;
}

export interface VolumeChartProps {
  title: string;
  lines: { key: string; valuesM3: readonly number[] }[];
  units: UnitSystem;
  hours: number;
  /** What the chart shows, in words, for screen readers and as a caption. */
  summary: string;
}

/** Volumes against the hour: the mass curve of a day, or the tank level over several days. */
export function VolumeChart({ title, lines, units, hours, summary }: VolumeChartProps) {
  const unit = unitOf('volume', units);
  const [boxRef, boxWidth] = useBoxWidth();
  return (
    <figure className="rounded-md border border-creek-100 p-2" aria-label={title}>
      <figcaption className="px-1 text-sm font-semibold text-creek-900">{title}</figcaption>
      <div ref={boxRef} className="h-64 w-full">
        {boxWidth > 0 && (
        <XYChart width={boxWidth} height={256} margin={{ top: 16, right: 16, bottom: 44, left: 64 }} xScale={{ type: 'linear', domain: [0, hours] }} yScale={{ type: 'linear', nice: true, zero: true }}>
          <Grid columns={false} numTicks={5} lineStyle={{ stroke: '#d5e9ef' }} />
          <Axis orientation="bottom" label="Hour" numTicks={Math.min(12, hours / 2)} />
          <Axis orientation="left" label={unit} numTicks={5} tickFormat={(value) => formatNumber(Number(value), 0)} />
          {lines.map((line) => (
            <LineSeries key={line.key} dataKey={line.key} data={series(line.valuesM3, units)} xAccessor={(d) => d.hour} yAccessor={(d) => d.volume} colorAccessor={colourOf} strokeWidth={2} />
          ))}
          <Tooltip<Point>
            snapTooltipToDatumX
            showVerticalCrosshair
            renderTooltip={({ tooltipData }) => {
              const nearest = tooltipData?.nearestDatum;
              if (!nearest) return null;
              return (
                <div className="text-xs">
                  <p className="font-semibold">Hour {nearest.datum.hour}</p>
                  {Object.entries(tooltipData.datumByKey).map(([key, entry]) => (
                    <p key={key} style={{ color: colourOf(key) }}>{key}: {formatNumber(entry.datum.volume)} {unit}</p>
                  ))}
                </div>
              );
            }}
          />
        </XYChart>
        )}
      </div>
      <ul className="flex flex-wrap gap-4 px-1 text-xs text-creek-700">
        {lines.map((line) => <li key={line.key} className="flex items-center gap-1"><span aria-hidden className="inline-block h-0.5 w-4" style={{ background: colourOf(line.key) }} />{line.key}</li>)}
      </ul>
      <p className="sr-only">{summary}</p>
    </figure>
  );
}
