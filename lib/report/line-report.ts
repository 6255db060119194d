import 'server-only';
import PDFDocument from 'pdfkit';
import type { LineAnalysis } from '../../hydraulics/index';
import type { ChartPhoto } from '../chart/photo-marks';
import { planScene, type PlanStation } from '../chart/plan-scene';
import { profileScene } from '../chart/profile-scene';
import { svgToString } from '../chart/svg-node';
import type { LineRecord } from '../data/lines';
import { lineAnswers } from '../lines/answers';
import { ramFeedAnswers } from '../lines/ram-feed';
import { EMPTY_SITE_CONTEXT, type LineSiteContext } from '../lines/ram-start';
import { lineFixItems } from '../lines/fix-items';
import { FRICTION_WORDS } from '../lines/answers';
import { stampRows, type ReviewStamp } from '../review/stamp';
import { displayUnits, formatHeadPressure, formatQuantity, unitSystemName, type UnitSystem } from '../units/index';
import { INK, labelGrid } from './pdf-table';
import { pdfText } from './pdf-text';
import { photoSection, type ReportPhoto } from './photo-section';
import { markEveryPage } from './review-mark';
import { drawSceneToFit, headEveryPage } from './page-furniture';
import { liftSection, networkFeedSection, winterSection } from './feed-sections';
import { assumptions, cautions, deviceList, stretchSchedule, warningList } from './report-sections';

export interface LineReportInput {
  project: { name: string; unitSystem: UnitSystem };
  line: LineRecord;
  analysis: LineAnalysis;
  /** The ram sites and frost depth the analysis read. @default none */
  context?: LineSiteContext;
  /** The line's first station ground, m (pump elevation when the ram site gives none). */
  startGroundM?: number;
  /** Which revision (or the working copy), its status, designer, reviewer and approval. */
  stamp: ReviewStamp;
  /**
   * Printed as the date and written as the file's creation date; a revision passes its own date so its PDF never
   * changes.
   */
  generatedAt: Date;
  /**
   * Site photos chosen for the report, in the line's window: marked on the profile and printed with their thumbnails.
   * @default none
   */
  photos?: readonly ReportPhoto[];
  /** The vertical exaggeration of the profile, as the screen shows it. @default 'auto' (the same on every width) */
  exaggeration?: number | 'auto';
  /** The line's stations with their map positions, for the plan view. @default none (no plan) */
  stations?: readonly PlanStation[];
}

const PAGE = { size: 'A4', layout: 'landscape', margin: 40 } as const;
const CONTENT_WIDTH = 842 - 2 * PAGE.margin;
/** The plan's drawing size (points on the page; equal scale both ways). */
const PLAN_SIZE = { width: 620, height: 400 } as const;

function windowWords(line: LineRecord, analysis: LineAnalysis, units: ReturnType<typeof displayUnits>): string {
  const c = analysis.points.chainageM;
  return `${line.routeName ?? 'route removed'}, ch. ${formatQuantity('chainage', c[0], units.system)} to ${formatQuantity('chainage', c[c.length - 1], units.system)}`;
}

/** The report's photos as the drawings mark them (number, label, own position). */
function chartPhotosOf(photos: readonly ReportPhoto[]): ChartPhoto[] {
  return photos.map((p) => ({
    id: p.id,
    chainageM: p.chainageM,
    number: p.number,
    label: p.caption || p.fileName,
    latitudeDeg: p.latitude,
    longitudeDeg: p.longitude,
  }));
}

/**
 * The report's profile: the screen's drawing at report width and the screen's exaggeration, with the chosen photos
 * marked.
 */
export function reportProfileScene(
  analysis: LineAnalysis,
  line: LineRecord,
  unitSystem: UnitSystem,
  photos: readonly ReportPhoto[] = [],
  exaggeration: number | 'auto' = 'auto',
) {
  return profileScene(
    analysis,
    {
      units: displayUnits(unitSystem),
      devices: line.design.devices,
      width: 1000,
      exaggeration,
      photos: chartPhotosOf(photos),
    },
    'report',
  );
}

/**
 * The line's design report as a PDF: title block, the answers, the long profile (the same drawing as
 * the screen, with the site photos chosen for it marked), stretch schedule, devices, warnings, the
 * chosen photos, assumptions and cautions. A4 landscape.
 */
export async function lineReportPdf({
  project,
  line,
  analysis,
  context = EMPTY_SITE_CONTEXT,
  startGroundM,
  stamp,
  generatedAt,
  photos = [],
  stations = [],
  exaggeration = 'auto',
}: LineReportInput): Promise<Buffer> {
  const u = displayUnits(project.unitSystem);
  const doc = new PDFDocument({
    ...PAGE,
    bufferPages: true,
    info: {
      Title: `${line.name}: line design report`,
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
    .text(pdfText(`${line.name}: line design report`));
  doc
    .font('Helvetica')
    .fontSize(9)
    .fillColor('#215d75')
    .text('Runnel \u00b7 gravity line design \u00b7 estimates for review, not a licensed design');
  doc.moveDown(0.5);
  labelGrid(
    doc,
    [
      ['Project', project.name],
      ['Line', line.name],
      ['Route', windowWords(line, analysis, u)],
      ...stampRows(stamp),
      ['Date', generatedAt.toISOString().slice(0, 10)],
      ['Units', unitSystemName(u.system)],
    ],
    5,
    CONTENT_WIDTH,
  );

  // The winter findings stand with the line's other items, as on the screen.
  const { winter, warnings } = lineFixItems(analysis, line.design.winter, context, false);
  const withWinter = { ...analysis, warnings };
  const answers = lineAnswers(withWinter);
  const t = analysis.settings.waterTemperatureC;
  const flowWords = answers.overCapacity
    ? `at most ${formatQuantity('designFlow', answers.capacityM3s, u.system)} (the design flow of ${formatQuantity('designFlow', answers.flowM3s, u.system)} is more than the line carries by gravity)`
    : `${formatQuantity('designFlow', answers.flowM3s, u.system)} (${answers.scheduled ? "at the start, from the network's solve; it drops at each take-off" : answers.flowSource === 'design' ? 'design flow' : 'found by gravity'})`;
  doc
    .font('Helvetica')
    .fontSize(9.5)
    .fillColor(INK)
    .text(
      pdfText(
        `Flow delivered: ${flowWords}. ` +
          `Residual at the end: ${formatHeadPressure(answers.endResidualHeadM, u.system, t)} (wanted ${formatHeadPressure(answers.endTargetHeadM, u.system, t)}). ` +
          `Worst static pressure: ${formatHeadPressure(answers.worstStatic.headM, u.system, t)} at ch. ${formatQuantity('chainage', answers.worstStatic.chainageM, u.system)} ` +
          `(${answers.worstStatic.pipeLabel} allows ${formatHeadPressure(answers.worstStatic.allowableHeadM, u.system, t)}). ` +
          `Warnings: ${answers.counts.danger} danger, ${answers.counts.warning} warning, ${answers.counts.info} advice. ` +
          (answers.frictionMethod ? FRICTION_WORDS[answers.frictionMethod] : ''),
      ),
    );
  doc.moveDown(0.4);

  // The whole drawing (axes, chainage title and legend) on the page: scaled to the room left, never cut.
  const scene = reportProfileScene(analysis, line, project.unitSystem, photos, exaggeration);
  drawSceneToFit(doc, svgToString(scene.root), scene.frame, { minHeight: 300 });
  const plan = planScene(stations, analysis.warnings, line.design.devices, PLAN_SIZE, u, chartPhotosOf(photos));
  doc.addPage();
  if (plan) {
    doc.font('Helvetica-Bold').fontSize(11).fillColor(INK).text('Plan of the line');
    doc
      .font('Helvetica')
      .fontSize(8.5)
      .fillColor(INK)
      .text(
        pdfText(
          'North up, equal scale both ways, from the surveyed positions; warning ranges, devices and photos as on the profile.',
        ),
      );
    doc.moveDown(0.3);
    drawSceneToFit(doc, svgToString(plan.root), PLAN_SIZE, { minHeight: 200 });
    doc.addPage();
  }
  const feed = ramFeedAnswers(line.design, context, analysis, startGroundM ?? analysis.points.groundElevationM[0]);
  if (feed) liftSection(doc, feed, u, t);
  if (context.network)
    networkFeedSection(
      doc,
      context.network,
      { start: line.design.start.kind !== 'ram-site', flow: analysis.flowSchedule !== undefined },
      u,
    );
  stretchSchedule(doc, analysis, u);
  deviceList(doc, analysis, line.design.devices, u);
  warningList(doc, withWinter, u);
  photoSection(doc, photos, u);
  winterSection(doc, winter, u);
  assumptions(doc, analysis, u);
  cautions(doc);
  markEveryPage(doc, stamp);
  headEveryPage(doc, `${project.name} \u00b7 ${line.name} \u00b7 line design report`);
  doc.end();
  return finished;
}
