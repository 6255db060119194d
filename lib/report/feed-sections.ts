import type PDFDocument from 'pdfkit';
import type { RamFeedAnswers } from '../lines/ram-feed';
import type { LineNetworkFlows } from '../network/line-flows';
import { drainPointsOf, type LineWinterPlan } from '../lines/winter';
import { heading, INK, table } from './pdf-table';
import { pdfText } from './pdf-text';
import { type DisplayUnits, formatDuration, formatHeadPressure, formatPercent, formatQuantity } from '../units';

type Doc = InstanceType<typeof PDFDocument>;

/**
 * The ram pump that feeds a delivery line: site, delivery, fill time, efficiency with its source, and the surge
 * caution.
 */
export function liftSection(doc: Doc, feed: RamFeedAnswers, u: DisplayUnits, temperatureC: number): void {
  const { outlet } = feed;
  heading(doc, 'Lift');
  const rows: [string, string][] = [
    [
      'Ram site',
      `${outlet.name}; pump at ${formatQuantity('length', feed.pumpElevationM, u.system)}${feed.pumpElevationFrom === 'line-start' ? ' (ground at the line start: the ram site gives no pump elevation)' : ''}`,
    ],
    [
      'Delivered flow per day',
      `${formatQuantity('flowPerDay', outlet.deliveredFlowM3s, u.system)} (${formatQuantity('flow', outlet.deliveredFlowM3s, u.system)})${feed.flowFromRam ? ', the flow this line is analysed at' : ''}`,
    ],
    [
      'Tank fill time',
      outlet.tankFillTimeS !== null && outlet.tankName
        ? `${outlet.tankName} from empty in ${formatDuration(outlet.tankFillTimeS)}, outlets shut`
        : 'no tank given for this ram site',
    ],
    [
      'Efficiency',
      `${formatPercent(outlet.efficiency)}, ${outlet.efficiencyBasis === 'measured' ? 'measured at commissioning' : `from ${outlet.efficiencySource}`}`,
    ],
    [
      'Head at the pump, delivering',
      `${formatHeadPressure(feed.workingHeadM, u.system, temperatureC)}: lift ${formatQuantity('length', outlet.liftM, u.system)} plus ${formatQuantity('headLoss', outlet.deliveryFrictionM, u.system)} friction`,
    ],
    [
      'Peak head at the pump, line shut',
      `${formatHeadPressure(feed.peakHeadAtPumpM, u.system, temperatureC)} against ${formatHeadPressure(feed.allowableHeadAtPumpM, u.system, temperatureC)} allowed for ${feed.pipeAtPumpLabel}${feed.peakWithinRating ? '' : ': OVER THE RATING'}`,
    ],
  ];
  table(
    doc,
    [
      { heading: 'Item', width: 200 },
      { heading: 'Value', width: 562 },
    ],
    rows.map(([k, v]) => [k, v]),
  );
  doc
    .font('Helvetica-Bold')
    .fontSize(9)
    .fillColor(INK)
    .text('Surge at the pump. ', { continued: true })
    .font('Helvetica')
    .text(pdfText(outlet.caution));
}

const TREATMENT_WORDS: Record<LineWinterPlan['treatment'], string> = {
  'buried-below-frost': 'buried below frost depth (stays full)',
  'drained-for-winter': 'drained for winter',
};

/** How the line is kept through winter and, for a drained line, where it is drained. */
export function winterSection(doc: Doc, plan: LineWinterPlan, u: DisplayUnits): void {
  heading(doc, 'Winter');
  const frost =
    plan.frostDepthM === null ? 'not set for the project' : formatQuantity('depth', plan.frostDepthM, u.system);
  doc
    .font('Helvetica')
    .fontSize(9)
    .fillColor(INK)
    .text(
      pdfText(
        `Through winter the line is ${TREATMENT_WORDS[plan.treatment]}${plan.chosen ? '' : ' (not chosen: assumed)'}. ` +
          `Site frost depth: ${frost}. Least cover over the pipe: ${formatQuantity('depth', plan.shallowestCoverM, u.system)} at ch. ${formatQuantity('chainage', plan.shallowestCoverAtM, u.system)}.`,
      ),
    );
  if (plan.warning) {
    doc
      .font('Helvetica-Bold')
      .fillColor('#9a3b24')
      .text('Shallower than frost. ', { continued: true })
      .font('Helvetica')
      .text(pdfText(`${plan.warning.message} Drain it for winter or lay it deeper.`));
    doc.fillColor(INK);
  }
  if (plan.treatment !== 'drained-for-winter') return;
  const drains = drainPointsOf(plan);
  doc.moveDown(0.3);
  if (drains.length === 0) {
    doc.text('Drain points: no low point stands out on this profile; drain at the lower end.');
    return;
  }
  table(
    doc,
    [
      { heading: 'Drain point', width: 120, align: 'right' },
      { heading: 'Where', width: 160 },
      { heading: 'Pipe elevation', width: 120, align: 'right' },
    ],
    drains.map((d) => [
      `ch. ${formatQuantity('chainage', d.chainageM, u.system)}`,
      d.place,
      formatQuantity('length', d.elevationM, u.system),
    ]),
  );
}

/** What feeds the line in the network and the flow of each piece the analysis used (it drops at every take-off). */
export function networkFeedSection(
  doc: Doc,
  flows: LineNetworkFlows,
  used: { start: boolean; flow: boolean },
  u: DisplayUnits,
): void {
  heading(doc, 'In the network');
  const start = !used.start
    ? 'The line names its ram site: its start is the ram plan (see Lift).'
    : flows.startFrom
      ? `The profile starts at ${flows.startFrom}${flows.feed ? ` (${flows.feed.name})` : ''}.`
      : "The network does not say what feeds this line; the line's own start is used.";
  const flow =
    flows.schedule && !used.flow
      ? " The analysis uses the ram's delivered flow; the network's flows are below for comparison."
      : flows.schedule
        ? ' Every check above ran with the solved flow of each piece below (peak hour).'
        : ` Not solved: ${flows.reason ?? 'no flow for this line'}; the line's own design flow is used.`;
  doc
    .font('Helvetica')
    .fontSize(9)
    .fillColor(INK)
    .text(pdfText(start + flow));
  if (!flows.schedule) return;
  doc.moveDown(0.3);
  table(
    doc,
    [
      { heading: 'From ch.', width: 110, align: 'right' },
      { heading: 'To ch.', width: 110, align: 'right' },
      { heading: 'After', width: 170 },
      { heading: 'Flow', width: 120, align: 'right' },
      { heading: 'Pipe', width: 252 },
    ],
    flows.pieces.map((piece) => [
      formatQuantity('chainage', piece.fromChainageM ?? 0, u.system),
      formatQuantity('chainage', piece.toChainageM ?? 0, u.system),
      flows.takeOffs.find((t) => Math.abs(t.chainageM - (piece.fromChainageM ?? -1)) < 1e-6)?.name ?? '',
      formatQuantity('designFlow', piece.flowM3s, u.system),
      piece.pipeLabel,
    ]),
  );
}
