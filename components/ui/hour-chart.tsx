'use client';

import { Axis, Grid, LineSeries, Tooltip, XYChart } from '@visx/xychart';
import { useEffect, useState } from 'react';
import { formatNumber, toDisplay, unitOf, type Quantity, type UnitSystem } from '@/lib/units';

interface Point {
  hour: number;
  value: number;
}

/** Named series keep their colour everywhere; others take the palette in order (creek, clay, moss, ochre...). */
const NAMED: Record<string, string> = {
  'Supply, cumulative': '#2d7590',
  'Demand, cumulative': '#b9462f',
  'Water in the tank': '#48702b',
};
const PALETTE = ['#2d7590', '#b9462f', '#48702b', '#a87a1c', '#5b4a8a', '#1f5f4a', '#8a3b5c', '#46606b'];

function series(values: readonly (number | null)[], quantity: Quantity, units: UnitSystem): Point[] {
  return values.flatMap((valueSi, hour) =>
    valueSi === null || !Number.isFinite(valueSi) ? [] : [{ hour, value: toDisplay(quantity, valueSi, units) }],
  );
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

export interface HourChartProps {
  title: string;
  /** Values in SI per hour boundary (null where there is none). */
  lines: { key: string; values: readonly (number | null)[] }[];
  /** What the values are (converted to the project's units). @default 'volume' */
  quantity?: Quantity;
  units: UnitSystem;
  hours: number;
  /** Start the value axis at zero. @default true */
  zero?: boolean;
  /** What the chart shows, in words, for screen readers and as a caption. */
  summary: string;
}

/** One quantity against the hour of the day: a mass curve, a tank's water, outlet pressures, a source's draw. */
export function HourChart({ title, lines, quantity = 'volume', units, hours, zero = true, summary }: HourChartProps) {
  const unit = unitOf(quantity, units);
  const colourOf = (key: string) =>
    NAMED[key] ??
    PALETTE[
      Math.max(
        0,
        lines.findIndex((line) => line.key === key),
      ) % PALETTE.length
    ];
  const [boxRef, boxWidth] = useBoxWidth();
  return (
    <figure className="rounded-md border border-creek-100 p-2" aria-label={title}>
      <figcaption className="px-1 text-sm font-semibold text-creek-900">{title}</figcaption>
      <div ref={boxRef} className="h-64 w-full">
        {boxWidth > 0 && (
          <XYChart
            width={boxWidth}
            height={256}
            margin={{ top: 16, right: 16, bottom: 44, left: 64 }}
            xScale={{ type: 'linear', domain: [0, hours] }}
            yScale={{ type: 'linear', nice: true, zero }}
          >
            <Grid columns={false} numTicks={5} lineStyle={{ stroke: '#d5e9ef' }} />
            <Axis orientation="bottom" label="Hour" numTicks={Math.min(12, hours / 2)} />
            <Axis
              orientation="left"
              label={unit}
              numTicks={5}
              tickFormat={(value) => formatNumber(Number(value), 'auto')}
            />
            {lines.map((line) => (
              <LineSeries
                key={line.key}
                dataKey={line.key}
                data={series(line.values, quantity, units)}
                xAccessor={(d) => d.hour}
                yAccessor={(d) => d.value}
                colorAccessor={colourOf}
                strokeWidth={2}
              />
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
                      <p key={key} style={{ color: colourOf(key) }}>
                        {key}: {formatNumber(entry.datum.value)} {unit}
                      </p>
                    ))}
                  </div>
                );
              }}
            />
          </XYChart>
        )}
      </div>
      <ul className="flex flex-wrap gap-4 px-1 text-xs text-creek-700">
        {lines.map((line) => (
          <li key={line.key} className="flex items-center gap-1">
            <span aria-hidden className="inline-block h-0.5 w-4" style={{ background: colourOf(line.key) }} />
            {line.key}
          </li>
        ))}
      </ul>
      <p className="sr-only">{summary}</p>
    </figure>
  );
}
