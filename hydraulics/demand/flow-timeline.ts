import { SECONDS_PER_DAY } from '../constants';
import { HOURS_PER_DAY } from './hourly-pattern';
import type { UseDelivery } from './use-types';

const SECONDS_PER_HOUR = 3600;

/** A steady flow over part of the day, seconds from midnight (end after start, within the day). */
export interface FlowInterval {
  startS: number;
  endS: number;
  flowM3s: number;
}

/**
 * When in the day a use draws its water and at what rate. A delivery window is its own interval
 * (a half-hour window runs at twice the rate its hourly bucket suggests); a pattern is one interval
 * per hour; a window past midnight is split in two.
 */
export function useFlowIntervals(delivery: UseDelivery, dailyVolumeM3: number): FlowInterval[] {
  switch (delivery.kind) {
    case 'delivery-hours': {
      const startS = (delivery.startHour ?? 6) * SECONDS_PER_HOUR;
      const durationS = delivery.hours * SECONDS_PER_HOUR;
      const flowM3s = dailyVolumeM3 / durationS;
      const endS = startS + durationS;
      if (endS <= SECONDS_PER_DAY) return [{ startS, endS, flowM3s }];
      return [
        { startS, endS: SECONDS_PER_DAY, flowM3s },
        { startS: 0, endS: endS - SECONDS_PER_DAY, flowM3s },
      ];
    }
    case 'pattern':
      return delivery.hourlyFractions.map((fraction, hour) => ({
        startS: hour * SECONDS_PER_HOUR,
        endS: (hour + 1) * SECONDS_PER_HOUR,
        flowM3s: (fraction * dailyVolumeM3) / SECONDS_PER_HOUR,
      }));
    case 'peak-factor':
      return [{ startS: 0, endS: HOURS_PER_DAY * SECONDS_PER_HOUR, flowM3s: dailyVolumeM3 / SECONDS_PER_DAY }];
  }
}

/**
 * Highest total flow when every use draws at its own rate at its own time: a sweep over the
 * interval ends, so linear in the number of intervals after the sort.
 */
export function peakOfSummedFlows(intervals: readonly FlowInterval[]): number {
  const events: [number, number][] = [];
  for (const { startS, endS, flowM3s } of intervals) {
    if (endS <= startS || flowM3s === 0) continue;
    events.push([startS, flowM3s], [endS, -flowM3s]);
  }
  // At one instant, ends are applied before starts: back-to-back windows do not add up.
  events.sort((a, b) => a[0] - b[0] || a[1] - b[1]);
  let current = 0;
  let peak = 0;
  for (let i = 0; i < events.length; i += 1) {
    current += events[i][1];
    const nextTime = i + 1 < events.length ? events[i + 1][0] : Infinity;
    if (nextTime > events[i][0]) peak = Math.max(peak, current);
  }
  return peak;
}
