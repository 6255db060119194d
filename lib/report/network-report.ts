import 'server-only';
import PDFDocument from 'pdfkit';
import { buildNetworkScene } from '../chart/network-scene';
import { svgToString } from '../chart/svg-node';
import { dayViewModel } from '../network/day-view';
import { networkFrictionWords } from '../network/friction-words';
import { layoutNetwork } from '../network/layout';
import type { DayRunResult, NetworkRunWarning, SizeRunResult, SolveRunResult } from '../network/run-result';
import type { NetworkView } from '../network/view';
import { stampRows, type ReviewStamp } from '../review/stamp';
import { formatNumber, formatQuantity, unitSystemName, type UnitSystem } from '../units/index';
import { heading, INK, labelGrid, table } from './pdf-table';
import { pdfText } from './pdf-text';
import { cautions } from './report-sections';
import { markEveryPage } from './review-mark';
import { drawSceneToFit, headEveryPage } from './page-furniture';

type Doc = InstanceType<typeof PDFDocument>;

export interface NetworkReportInput {
  project: { name: string; unitSystem: UnitSystem };
  view: NetworkView;
  /** The network solved at the peak hour now, or why it could not be. */
  solve: SolveRunResult | null;
  solveProblem: string | null;
  /** The latest finished sizing and day runs, when there are any. */
  sized: { result: SizeRunResult; finishedAt: string | null } | null;
  day: { result: DayRunResult; finishedAt: string | null } | null;
  stamp: ReviewStamp;
  generatedAt: Date;
}

const PAGE = { size: 'A4', layout: 'landscape', margin: 40 } as const;
const CONTENT_WIDTH = 842 - 2 * PAGE.margin;
const KIND_WORDS: Record<string, string> = {
  source: 'Source',
  'ram-outlet': 'Ram outlet',
  tank: 'Tank',
  'break-pressure-tank': 'Break-pressure tank',
  junction: 'Take-off',
  outlet: 'Outlet',
  line: 'Line',
  pipe: 'Pipe',
  valve: 'Valve',
};

function text(doc: Doc, words: string): void {
  doc.font('Helvetica').fontSize(9).fillColor(INK).text(pdfText(words), doc.page.margins.left);
}

function findings(doc: Doc, view: NetworkView, warnings: readonly NetworkRunWarning[], u: UnitSystem): void {
  if (warnings.length === 0) return text(doc, 'Nothing flagged.');
  const nameOf = (w: NetworkRunWarning) =>
    view.records.nodes.find((n) => n.id === w.nodeId)?.name ??
    view.records.links.find((l) => l.id === w.linkId)?.name ??
    'the network';
  table(
    doc,
    [
      { heading: 'Severity', width: 70 },
      { heading: 'Part', width: 170 },
      { heading: 'Finding', width: 522 },
    ],
    warnings.map((w) => [
      w.severity,
      `${nameOf(w)}${w.chainageM !== undefined ? ` at ch. ${formatQuantity('chainage', w.chainageM, u)}` : ''}`,
      w.message,
    ]),
  );
}

function nodeTable(doc: Doc, view: NetworkView, solve: SolveRunResult, u: UnitSystem): void {
  const results = new Map(solve.nodes.map((n) => [n.nodeId, n]));
  table(
    doc,
    [
      { heading: 'Node', width: 200 },
      { heading: 'Kind', width: 100 },
      { heading: 'Elevation', width: 90, align: 'right' },
      { heading: 'Head', width: 90, align: 'right' },
      { heading: 'Pressure head', width: 100, align: 'right' },
      { heading: 'Wants', width: 80, align: 'right' },
      { heading: 'Draw at peak', width: 102, align: 'right' },
    ],
    view.records.nodes.map((node) => {
      const r = results.get(node.id);
      const short =
        r && r.pressureHeadM !== null && r.minPressureHeadM !== null && r.pressureHeadM < r.minPressureHeadM - 1e-6;
      return [
        node.name,
        KIND_WORDS[node.kind] ?? node.kind,
        r ? formatQuantity('elevation', r.elevationM, u) : '—',
        r?.headM != null ? formatQuantity('elevation', r.headM, u) : '—',
        r?.pressureHeadM != null ? `${formatQuantity('head', r.pressureHeadM, u)}${short ? ' SHORT' : ''}` : '—',
        r?.minPressureHeadM != null ? formatQuantity('head', r.minPressureHeadM, u) : '—',
        r && r.demandM3s !== 0
          ? `${formatQuantity('designFlow', Math.abs(r.demandM3s), u)}${r.demandM3s < 0 ? ' in' : ''}`
          : '—',
      ];
    }),
  );
}

function linkTable(doc: Doc, view: NetworkView, solve: SolveRunResult, u: UnitSystem): void {
  const names = new Map(view.records.nodes.map((n) => [n.id, n.name]));
  const results = new Map(solve.links.map((l) => [l.linkId, l]));
  const rows: string[][] = [];
  for (const link of view.records.links) {
    const r = results.get(link.id);
    const ends = `${names.get(link.fromNodeId) ?? '?'} to ${names.get(link.toNodeId) ?? '?'}`;
    if (!r) {
      rows.push([link.name, KIND_WORDS[link.kind], ends, '—', '—', '—', '—']);
      continue;
    }
    for (const piece of r.pieces) {
      const window =
        piece.fromChainageM !== null
          ? ` ch. ${formatQuantity('chainage', piece.fromChainageM, u)}-${formatQuantity('chainage', piece.toChainageM ?? 0, u)}`
          : '';
      rows.push([
        `${link.name}${window}`,
        KIND_WORDS[link.kind],
        ends,
        piece.pipeLabel,
        formatQuantity('designFlow', piece.flowM3s, u),
        formatQuantity('velocity', Math.abs(piece.velocityMs), u),
        formatQuantity('head', piece.headLossM, u),
      ]);
    }
  }
  table(
    doc,
    [
      { heading: 'Link', width: 190 },
      { heading: 'Kind', width: 50 },
      { heading: 'From - to', width: 170 },
      { heading: 'Pipe', width: 150 },
      { heading: 'Flow', width: 70, align: 'right' },
      { heading: 'Velocity', width: 62, align: 'right' },
      { heading: 'Head loss', width: 70, align: 'right' },
    ],
    rows,
  );
}

function sizesSection(
  doc: Doc,
  view: NetworkView,
  sized: { result: SizeRunResult; finishedAt: string | null },
  u: UnitSystem,
): void {
  const { result } = sized;
  heading(doc, 'Least-cost sizes');
  text(
    doc,
    `From the sizing run of ${sized.finishedAt?.slice(0, 16).replace('T', ' ') ?? 'an unknown time'} (UTC), with the team's price list. ` +
      (result.feasible && result.cost !== null
        ? `Material cost of the chosen pipes: ${formatNumber(result.cost, 0)}.` +
          (result.uniform
            ? ` One size everywhere (${result.uniform.pipeLabel}): ${formatNumber(result.uniform.cost, 0)}${result.uniform.feasible ? '' : ', which fails a limit'}.`
            : '')
        : 'No set of sizes in the price list meets every limit.'),
  );
  if (!result.solution) return;
  doc.moveDown(0.3);
  const names = new Map(view.records.links.map((l) => [l.id, l.name]));
  table(
    doc,
    [
      { heading: 'Link', width: 260 },
      { heading: 'Chainage', width: 160 },
      { heading: 'Chosen pipe', width: 200 },
      { heading: 'Flow at peak', width: 142, align: 'right' },
    ],
    result.solution.links.flatMap((link) =>
      link.pieces.map((piece) => [
        names.get(link.linkId) ?? 'a link no longer in the network',
        piece.fromChainageM !== null
          ? `${formatQuantity('chainage', piece.fromChainageM, u)} to ${formatQuantity('chainage', piece.toChainageM ?? 0, u)}`
          : 'whole pipe',
        piece.pipeLabel,
        formatQuantity('designFlow', piece.flowM3s, u),
      ]),
    ),
  );
}

function daySection(
  doc: Doc,
  view: NetworkView,
  day: { result: DayRunResult; finishedAt: string | null },
  u: UnitSystem,
): void {
  const model = dayViewModel(view, day.result);
  heading(doc, 'A day of operation');
  text(
    doc,
    `Hourly steps over ${model.hours} hours, from the run of ${day.finishedAt?.slice(0, 16).replace('T', ' ') ?? 'an unknown time'} (UTC). Tanks start half full; each outlet draws with the hourly pattern of its uses.`,
  );
  doc.moveDown(0.3);
  if (model.tanks.length > 0) {
    table(
      doc,
      [
        { heading: 'Tank', width: 220 },
        { heading: 'Lowest depth', width: 130, align: 'right' },
        { heading: 'Highest depth', width: 130, align: 'right' },
        { heading: 'Overflows at', width: 130, align: 'right' },
        { heading: 'Storage its outlets need', width: 152, align: 'right' },
      ],
      model.tanks.map((t) => [
        t.name,
        formatQuantity('length', t.lowestDepthM, u),
        formatQuantity('length', t.highestDepthM, u),
        formatQuantity('length', t.overflowDepthM, u),
        t.storageNeededM3 === null ? '—' : formatQuantity('volume', t.storageNeededM3, u),
      ]),
    );
  }
  if (model.outlets.length > 0) {
    doc.moveDown(0.3);
    table(
      doc,
      [
        { heading: 'Outlet', width: 300 },
        { heading: 'Wants', width: 150, align: 'right' },
        { heading: 'Lowest in the day', width: 170, align: 'right' },
        { heading: 'At hour', width: 142, align: 'right' },
      ],
      model.outlets.map((o) => [
        o.name,
        o.wantedM === null ? '—' : formatQuantity('head', o.wantedM, u),
        o.lowest ? `${formatQuantity('head', o.lowest.pressureHeadM, u)}${o.short ? ' SHORT' : ''}` : '—',
        o.lowest ? `${o.lowest.hour}:00` : '—',
      ]),
    );
  }
  doc.moveDown(0.3);
  findings(doc, view, day.result.warnings, u);
}

/**
 * The project's network as a PDF: the schematic, node heads and pressures, link flows and velocities, least-cost sizes
 * and cost, the day.
 */
export async function networkReportPdf({
  project,
  view,
  solve,
  solveProblem,
  sized,
  day,
  stamp,
  generatedAt,
}: NetworkReportInput): Promise<Buffer> {
  const u = project.unitSystem;
  const doc = new PDFDocument({
    ...PAGE,
    bufferPages: true,
    info: {
      Title: `${project.name}: water network report`,
      Subject: project.name,
      Creator: 'Runnel',
      CreationDate: generatedAt,
    },
  });
  const chunks: Buffer[] = [];
  doc.on('data', (chunk: Buffer) => chunks.push(chunk));
  const finished = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });

  doc
    .font('Helvetica-Bold')
    .fontSize(16)
    .fillColor(INK)
    .text(pdfText(`${project.name}: water network report`));
  doc
    .font('Helvetica')
    .fontSize(9)
    .fillColor('#215d75')
    .text('Runnel \u00b7 the water system as one network \u00b7 estimates for review, not a licensed design');
  doc.moveDown(0.5);
  labelGrid(
    doc,
    [
      ['Project', project.name],
      ['Parts', `${view.records.nodes.length} nodes, ${view.records.links.length} links`],
      ...stampRows(stamp),
      ['Date', generatedAt.toISOString().slice(0, 10)],
      ['Units', unitSystemName(u)],
    ],
    5,
    CONTENT_WIDTH,
  );

  heading(doc, 'Schematic at the peak hour');
  if (view.records.nodes.length > 0) {
    const width = 1000;
    const height = 500;
    const scene = buildNetworkScene({ view, layout: layoutNetwork(view), solve, units: u, width, height });
    drawSceneToFit(doc, svgToString(scene), { width, height }, { minHeight: 250 });
  }
  doc.addPage();
  if (solve) {
    heading(doc, 'Nodes at the peak hour');
    text(
      doc,
      `${solve.converged ? 'Converged' : 'Did NOT converge'} in ${solve.iterations} iterations. Every outlet draws its peak; tanks sit at their lowest working level. ${networkFrictionWords(solve.friction)}`,
    );
    doc.moveDown(0.3);
    nodeTable(doc, view, solve, u);
    heading(doc, 'Links at the peak hour');
    linkTable(doc, view, solve, u);
    heading(doc, 'Findings at the peak hour');
    findings(doc, view, solve.warnings, u);
  } else {
    heading(doc, 'Peak-hour solve');
    text(doc, `The network could not be solved: ${solveProblem ?? 'no reason given'}.`);
  }
  if (sized) sizesSection(doc, view, sized, u);
  if (day) daySection(doc, view, day, u);
  cautions(doc);
  markEveryPage(doc, stamp);
  headEveryPage(doc, `${project.name} \u00b7 water network report`);
  doc.end();
  return finished;
}
