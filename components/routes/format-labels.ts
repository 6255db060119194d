import type { HeightSource } from '@/hydraulics/index';
import type { RouteSourceFormat } from '@/models/route';

export const FORMAT_LABELS: Record<RouteSourceFormat, string> = {
  'gps-csv': 'GPS track (CSV)',
  'station-csv': 'Stations and heights (CSV)',
  gpx: 'GPS track (GPX)',
  'inclinometer-csv': 'Clinometer traverse (CSV)',
  'level-book-csv': 'Level book (CSV)',
  sketch: 'Sketched',
  joined: 'Joined routes',
  split: 'Split from a route',
  typed: 'Typed in',
};

export const HEIGHT_SOURCE_LABELS: Record<HeightSource, string> = {
  gps: 'Phone or handheld GPS',
  gnss: 'Survey-grade GNSS',
  level: 'Level (instrument)',
  'hose-level': 'Hose level',
  inclinometer: 'Clinometer and tape',
  altimeter: 'Altimeter',
  map: 'Map or terrain model',
  typed: 'Typed in',
};
