import type { FieldWord, FieldWordTable } from './field-words';

/**
 * The screen's names and quantities of each form's fields (see field-words.ts). Labels are the ones
 * the forms print beside their boxes; `#` is a list position counted from 1.
 */

/**
 * The line designer: ends, flow, stretches, fittings, devices, custom pipes, settings; and the core's station fields.
 */
export const LINE_DESIGN_WORDS: FieldWordTable = {
  'start.levelM': { label: 'Start: water level', quantity: 'elevation' },
  'start.outletHeadM': { label: 'Start: grade at the pump outlet, pumping', quantity: 'elevation' },
  'start.shutoffHeadM': { label: 'Start: grade with the line shut', quantity: 'elevation' },
  'start.ramSiteId': { label: 'Start: ram site' },
  'end.elevationM': { label: 'End: elevation', quantity: 'elevation' },
  'end.residualHeadM': { label: 'End: residual pressure wanted', quantity: 'head' },
  'flow.flowM3s': { label: 'Design flow', quantity: 'designFlow' },
  'flow.kind': { label: 'Flow' },
  stretches: { label: 'Pipe stretches' },
  'stretches.#.fromM': { label: 'Pipe stretch #: start', quantity: 'chainage' },
  'stretches.#.toM': { label: 'Pipe stretch #: end', quantity: 'chainage' },
  'stretches.#.pipe': { label: 'Pipe stretch #: pipe' },
  fittings: { label: 'Fittings' },
  'fittings.#.chainageM': { label: 'Fitting #: chainage', quantity: 'chainage' },
  'fittings.#.k': { label: 'Fitting #: loss coefficient K' },
  'fittings.#.label': { label: 'Fitting #: name' },
  devices: { label: 'Devices' },
  'devices.#.chainageM': { label: 'Device #: chainage', quantity: 'chainage' },
  'devices.#.waterLevelM': { label: 'Device #: tank water level', quantity: 'elevation' },
  // The kind's refusal is a choice to make ("Device 2: choose a kind: …"), so it names the device alone.
  'devices.#.kind': { label: 'Device #' },
  'devices.#.label': { label: 'Device #: name' },
  'pipes.#.label': { label: 'Custom pipe #: name' },
  'pipes.#.nominalSize': { label: 'Custom pipe #: nominal size' },
  'pipes.#.outsideDiameterM': { label: 'Custom pipe #: outside diameter', quantity: 'diameter' },
  'pipes.#.insideDiameterM': { label: 'Custom pipe #: inside diameter', quantity: 'diameter' },
  'pipes.#.wallM': { label: 'Custom pipe #: wall', quantity: 'diameter' },
  'pipes.#.pressureRatingPa': { label: 'Custom pipe #: pressure rating', quantity: 'pressure' },
  'pipes.#.hazenWilliamsC': { label: 'Custom pipe #: Hazen-Williams C' },
  'pipes.#.roughnessM': { label: 'Custom pipe #: roughness', quantity: 'diameter' },
  'pipes.#.waveSpeedMs': { label: 'Custom pipe #: wave speed', quantity: 'velocity' },
  'settings.waterTemperatureC': { label: 'Water temperature', quantity: 'temperature' },
  'settings.safetyFactor': { label: 'Safety factor on ratings' },
  'settings.defaultCoverM': { label: 'Pipe cover', quantity: 'depth' },
  'settings.velocityMinMs': { label: 'Lowest velocity', quantity: 'velocity' },
  'settings.velocityMaxMs': { label: 'Highest velocity', quantity: 'velocity' },
  'settings.minResidualHeadM': { label: 'Minimum residual at outlets', quantity: 'head' },
  'settings.siphonLimitHeadM': { label: 'Siphon limit', quantity: 'head' },
  'settings.airPointToleranceM': { label: 'High/low point tolerance', quantity: 'depth' },
  'settings.siteAltitudeM': { label: 'Site altitude', quantity: 'elevation' },
  'settings.entranceLossK': { label: 'Entrance loss K at tanks' },
  'settings.frictionMethod': { label: 'Friction method' },
  'winter.treatment': { label: 'Winter' },
  'stations.#.chainageM': { label: 'Survey point #: chainage', quantity: 'chainage' },
  'stations.#.groundElevationM': { label: 'Survey point #: ground elevation', quantity: 'elevation' },
  'stations.#.coverM': { label: 'Survey point #: cover', quantity: 'depth' },
};

/** The custom pipe form (one pipe alone: the same names without "Custom pipe n: "). */
export const CUSTOM_PIPE_WORDS: FieldWordTable = Object.fromEntries(
  Object.entries(LINE_DESIGN_WORDS)
    .filter(([key]) => key.startsWith('pipes.#.'))
    .map(([key, word]) => [
      key.slice('pipes.#.'.length),
      { ...word, label: word.label.replace('Custom pipe #: ', '').replace(/^./, (c) => c.toUpperCase()) },
    ]),
);

/** A new line: its name and the chainage window it takes of its route. */
export const NEW_LINE_WORDS: FieldWordTable = {
  name: { label: 'Line name' },
  routeId: { label: 'Route' },
  fromChainageM: { label: 'From chainage', quantity: 'chainage' },
  toChainageM: { label: 'To chainage', quantity: 'chainage' },
  ...Object.fromEntries(Object.entries(LINE_DESIGN_WORDS).map(([key, word]) => [`design.${key}`, word])),
};

/** The ram form (lib/validations/ram-sites.ts), labels as on the Lift & storage page. */
export const RAM_SITE_WORDS: FieldWordTable = {
  name: { label: 'Site name' },
  driveFlowM3s: { label: 'Drive flow available', quantity: 'flow' },
  fallM: { label: 'Fall, source water level to pump', quantity: 'head' },
  liftM: { label: 'Lift, pump to delivery outlet', quantity: 'head' },
  pumpElevationM: { label: 'Pump elevation', quantity: 'elevation' },
  'drivePipe.lengthM': { label: 'Drive pipe length', quantity: 'length' },
  'drivePipe.insideDiameterM': { label: 'Drive pipe bore', quantity: 'diameter' },
  'deliveryPipe.lengthM': { label: 'Delivery pipe length', quantity: 'length' },
  'deliveryPipe.insideDiameterM': { label: 'Delivery pipe bore', quantity: 'diameter' },
  'deliveryPipe.hazenWilliamsC': { label: 'Hazen-Williams C' },
  'deliveryPipe.pressureRatingPa': { label: 'Pressure rating', quantity: 'pressure' },
  'deliveryPipe.pipeId': { label: 'Delivery pipe size' },
  pumpCount: { label: 'Pumps in parallel' },
};

/** The tank form (lib/validations/tanks.ts). */
export const TANK_WORDS: FieldWordTable = {
  name: { label: 'Tank name' },
  volumeM3: { label: 'Volume', quantity: 'volume' },
  baseElevationM: { label: 'Floor elevation', quantity: 'elevation' },
  lowLevelM: { label: 'Lowest working level above floor', quantity: 'length' },
  overflowLevelM: { label: 'Overflow level above floor', quantity: 'length' },
  supplyFlowM3s: { label: 'Supply flow', quantity: 'flow' },
  supplyHoursPerDay: { label: 'Supply hours per day' },
  supplyStartHour: { label: 'Supply starts at hour' },
  reserveDays: { label: 'Reserve wanted (days)' },
  'outlets.#.label': { label: 'Outlet #: name' },
  'outlets.#.elevationM': { label: 'Outlet #: elevation', quantity: 'elevation' },
  'outlets.#.residualHeadM': { label: 'Outlet #: residual head wanted', quantity: 'head' },
  'outlets.#.frictionLossM': { label: 'Outlet #: friction loss to it', quantity: 'headLoss' },
};

/** The network's part and pipe forms (lib/validations/network.ts). */
export const NETWORK_WORDS: FieldWordTable = {
  name: { label: 'Name' },
  elevationM: { label: 'Elevation', quantity: 'elevation' },
  chainageM: { label: 'Chainage', quantity: 'chainage' },
  'data.waterLevelM': { label: 'Water level', quantity: 'elevation' },
  'data.residualHeadM': { label: 'Residual head wanted', quantity: 'head' },
  'data.fixedDemandM3s': { label: 'Fixed demand', quantity: 'designFlow' },
  'data.typedPumpHead.outletHeadM': { label: 'Pump outlet head', quantity: 'head' },
  'data.typedPumpHead.shutoffHeadM': { label: 'Pump shut-off head', quantity: 'head' },
  'data.lengthM': { label: 'Length', quantity: 'length' },
  'data.insideDiameterM': { label: 'Inside diameter', quantity: 'diameter' },
  'data.hazenC': { label: 'Hazen-Williams C' },
  'data.minorK': { label: 'Minor loss coefficient' },
  'data.setHeadM': { label: 'Set pressure head', quantity: 'head' },
  'data.pipe': { label: 'Pipe' },
};

/** A take-off placed on a line's long profile (network.ts TakeOffSchema). */
export const TAKE_OFF_WORDS: FieldWordTable = {
  name: { label: 'Take-off name' },
  chainageM: { label: 'Chainage', quantity: 'chainage' },
};

/** A site photo's place on its route (lib/validations/photos.ts). */
export const PHOTO_WORDS: FieldWordTable = {
  chainageM: { label: 'Chainage', quantity: 'chainage' },
};

/**
 * A daily use on the Lift & storage page (lib/validations/demand-uses.ts); the amount's unit follows its kind, so only
 * the garden's area is converted.
 */
const DEMAND_USE_WORDS: FieldWordTable = {
  label: { label: 'Label' },
  areaM2: { label: 'Garden area', quantity: 'area' },
  peakFactor: { label: 'Peak factor' },
  deliveryHours: { label: 'Hours of delivery' },
};

/** A use's own figure as the form names it for each kind: a volume a day per person, per head or in all; a depth. */
const OWN_FIGURE_WORDS: Readonly<Record<string, FieldWord>> = {
  people: { label: 'Own figure per person', quantity: 'volumePerDay' },
  livestock: { label: 'Own figure per head', quantity: 'volumePerDay' },
  garden: { label: 'Own figure of depth', quantity: 'depthPerDay' },
  fixed: { label: 'Daily volume', quantity: 'volumePerDay' },
};

/** A field of a body as sent (not yet checked), or undefined. */
const sent = (body: unknown, key: string): unknown =>
  typeof body === 'object' && body !== null ? (body as Record<string, unknown>)[key] : undefined;

/** A daily use's words for the kind the body names (an unknown kind keeps the plain table). */
export function demandUseWords(body: unknown): FieldWordTable {
  const kind = sent(body, 'kind');
  const ownFigure = typeof kind === 'string' ? OWN_FIGURE_WORDS[kind] : undefined;
  return ownFigure ? { ...DEMAND_USE_WORDS, ownFigure } : DEMAND_USE_WORDS;
}

/**
 * The survey import's options (lib/validations/survey-import.ts) for the format the body names: the field books' typed
 * levels, named as the import screen names them, are in the project's units.
 */
export function surveyImportWords(body: unknown): FieldWordTable {
  const first =
    sent(body, 'format') === 'inclinometer-csv' ? 'Height of the first mark' : 'Reduced level of the first station';
  return {
    name: { label: 'Route name' },
    startElevationM: { label: first, quantity: 'elevation' },
    closingElevationM: { label: 'Known level of the last station', quantity: 'elevation' },
  };
}

/** A route's points and its tools (save, split, trim, join), labels as on the route page. */
export const ROUTE_WORDS: FieldWordTable = {
  'points.#.chainageM': { label: 'Point #: chainage', quantity: 'chainage' },
  'points.#.elevationM': { label: 'Point #: elevation', quantity: 'elevation' },
  'points.#.confidenceM': { label: 'Point #: height accuracy', quantity: 'depth' },
  'points.#.latitude': { label: 'Point #: latitude' },
  'points.#.longitude': { label: 'Point #: longitude' },
  chainageM: { label: 'Split at chainage', quantity: 'chainage' },
  fromChainageM: { label: 'Keep from', quantity: 'chainage' },
  toChainageM: { label: 'Keep to', quantity: 'chainage' },
  gapM: { label: 'Gap', quantity: 'length' },
};

/** The project details form. */
export const PROJECT_WORDS: FieldWordTable = {
  name: { label: 'Project name' },
  frostDepthM: { label: 'Frost depth', quantity: 'depth' },
};
