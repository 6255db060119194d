/** One line of the commissioning checklist or the troubleshooting notes, with its basis. */
export interface RamFieldNote {
  id: string;
  text: string;
  source: string;
}

import { CLEMSON, NO_SOURCE, USDA_BULLETIN } from './rule-sources';

/** Steps to bring a ram into service, in order. */
export const RAM_COMMISSIONING_CHECKLIST: readonly RamFieldNote[] = [
  {
    id: 'silt-trap',
    text: 'Put a settling bucket or box with a screen ahead of the drive pipe so silt and leaves stay out of the pump.',
    source: NO_SOURCE,
  },
  {
    id: 'bleed-drive-air',
    text: 'Fill the drive pipe from the top and let all air out: air in the drive pipe stops the ram.',
    source: NO_SOURCE,
  },
  {
    id: 'fill-delivery',
    text: 'Fill the delivery line before starting: the ram will not run with the delivery line empty or open to the air.',
    source: NO_SOURCE,
  },
  {
    id: 'back-pressure',
    text: 'Make sure the delivery line holds at least 10 psi (about 7 m) of back-pressure at the pump.',
    source: CLEMSON,
  },
  {
    id: 'prime-by-hand',
    text: 'Work the waste valve by hand, many times (up to a hundred), until the ram keeps beating by itself.',
    source: NO_SOURCE,
  },
  {
    id: 'beat-rate',
    text: 'Count the beats per minute; an ordinary small ram beats about 60 times a minute. Adjust the waste-valve stroke to tune it.',
    source: USDA_BULLETIN,
  },
  {
    id: 'measure',
    text: 'Time a bucket at the delivery outlet and at the waste valve, read the supply and delivery heads, and log them to get the measured efficiency.',
    source: NO_SOURCE,
  },
];

/** What to look at when the ram stops or delivers less than planned. */
export const RAM_TROUBLESHOOTING_NOTES: readonly RamFieldNote[] = [
  {
    id: 'stops-empty-delivery',
    text: 'Stops at once: the delivery line is empty, open or broken, so there is no back-pressure. Refill it and prime again.',
    source: NO_SOURCE,
  },
  {
    id: 'stops-air',
    text: 'Beats weakly then stops: air in the drive pipe (a leak at a joint, or the intake drawing air). Raise the intake water level, tighten joints, bleed the pipe.',
    source: NO_SOURCE,
  },
  {
    id: 'silt',
    text: 'Delivery falls off over weeks: silt or debris in the valves or the drive pipe. Clean the settling box and the valves.',
    source: NO_SOURCE,
  },
  {
    id: 'low-supply',
    text: 'Beats irregularly in the dry season: the source no longer gives the drive flow. Shorten the waste-valve stroke or run fewer pumps.',
    source: NO_SOURCE,
  },
  {
    id: 'frost',
    text: 'Lines above frost depth must be drained before winter, and the ram with them unless it is kept running.',
    source: NO_SOURCE,
  },
];
