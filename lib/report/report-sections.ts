import type PDFDocument from 'pdfkit';
import { DEFAULT_LINE_SETTINGS, type LineAnalysis, type LineDevice } from '../../hydraulics/index';
import { LINE_CAUTIONS } from '../lines/cautions';
import { DEVICE_KIND_NAMES } from '../validations/line-design';
import { placeWords, SEVERITY_WORDS, warningText } from '../lines/warning-words';
import {
  formatHeadPressure,
  formatNumber,
  formatQuantity,
  formatTemperature,
  toDisplay,
  type DisplayUnits,
} from '../units/index';
import { heading, INK, table } from './pdf-table';
import { pdfText } from './pdf-text';

type Doc = InstanceType<typeof PDFDocument>;

export function stretchSchedule(doc: Doc, a: LineAnalysis, u: DisplayUnits): void {
  heading(doc, 'Stretch schedule');
  const t = a.settings.waterTemperatureC;
  table(
    doc,
    [
      { heading: 'No.', width: 30 },
      { heading: 'From', width: 62, align: 'right' },
      { heading: 'To', width: 62, align: 'right' },
      { heading: 'Pipe length', width: 68, align: 'right' },
      { heading: 'Pipe', width: 200 },
      { heading: 'Class / rating', width: 100 },
      { heading: 'Allowed', width: 120, align: 'right' },
      { heading: 'Velocity', width: 60, align: 'right' },
      { heading: 'Friction loss', width: 60, align: 'right' },
    ],
    a.stretches.map((s) => [
      String(s.index + 1),
      formatQuantity('chainage', s.fromM, u.system),
      formatQuantity('chainage', s.toM, u.system),
      formatQuantity('length', s.slopeLengthM, u.system),
      s.pipe.label,
      `${s.pipe.sdr ? `SDR ${s.pipe.sdr}` : s.pipe.sidr ? `SIDR ${s.pipe.sidr}` : s.pipe.material}, ${formatQuantity('pressure', s.pipe.pressureRatingPa, u.system)}`,
      formatHeadPressure(s.allowableHeadM, u.system, t),
      formatQuantity('velocity', s.velocityMs, u.system),
      formatQuantity('headLoss', s.frictionLossM, u.system),
    ]),
  );
}

export function deviceList(doc: Doc, a: LineAnalysis, devices: readonly LineDevice[], u: DisplayUnits): void {
  heading(doc, 'Devices by chainage');
  if (devices.length === 0) {
    doc.font('Helvetica').fontSize(9).fillColor(INK).text('No devices placed on this line.');
    return;
  }
  const { chainageM, pipeElevationM } = a.points;
  const pipeAt = (c: number) => {
    let i = 0;
    while (i < chainageM.length - 1 && chainageM[i + 1] <= c) i++;
    return pipeElevationM[i];
  };
  table(
    doc,
    [
      { heading: 'Chainage', width: 90, align: 'right' },
      { heading: 'Device', width: 160 },
      { heading: 'Pipe elevation', width: 100, align: 'right' },
      { heading: 'Notes', width: 412 },
    ],
    [...devices]
      .sort((x, y) => x.chainageM - y.chainageM)
      .map((d) => {
        const tank =
          d.kind === 'break-pressure-tank'
            ? a.tanks.find((t) => Math.abs(t.chainageM - d.chainageM) < 1e-6)
            : undefined;
        const notes = [tank ? `water level ${formatQuantity('length', tank.waterLevelM, u.system)}` : '', d.label ?? '']
          .filter(Boolean)
          .join('; ');
        return [
          formatQuantity('chainage', d.chainageM, u.system),
          DEVICE_KIND_NAMES[d.kind],
          formatQuantity('length', pipeAt(d.chainageM), u.system),
          notes,
        ];
      }),
  );
}

export function warningList(doc: Doc, a: LineAnalysis, u: DisplayUnits): void {
  heading(doc, `Warnings (${a.warnings.length})`);
  if (a.warnings.length === 0) {
    doc.font('Helvetica').fontSize(9).fillColor(INK).text('The checks found nothing to warn about on this line.');
    return;
  }
  table(
    doc,
    [
      { heading: 'Severity', width: 58 },
      { heading: 'What and where', width: 150 },
      { heading: 'Why', width: 330 },
      { heading: 'Suggested fix', width: 224 },
    ],
    a.warnings.map((w) => {
      const text = warningText(w, u);
      return [SEVERITY_WORDS[w.severity], `${text.title}\n${placeWords(w.at, u)}`, text.message, text.fix];
    }),
  );
}

export function assumptions(doc: Doc, a: LineAnalysis, u: DisplayUnits): void {
  heading(doc, 'Assumptions');
  const s = a.settings;
  const method =
    s.frictionMethod === 'hazen-williams'
      ? 'Hazen-Williams (C per pipe below)'
      : 'Darcy-Weisbach with Colebrook friction factor (roughness per pipe below)';
  const rows: [string, string][] = [
    ['Friction method', method],
    [
      'Water temperature',
      `${formatTemperature(s.waterTemperatureC, u.system)} (viscosity, vapour pressure and plastic pipe derating)`,
    ],
    [
      'Safety factor on pipe ratings',
      `${formatNumber(s.safetyFactor, 2)} (allowed head = rating derated for temperature / safety factor)`,
    ],
    [
      'Velocity band',
      `${formatQuantity('velocity', s.velocityMinMs, u.system)} to ${formatQuantity('velocity', s.velocityMaxMs, u.system)}`,
    ],
    [
      'Residual pressure wanted at the end',
      formatHeadPressure(a.end.targetResidualHeadM, u.system, s.waterTemperatureC),
    ],
    ['Pipe cover where the survey gives none', formatQuantity('depth', s.defaultCoverM, u.system)],
    ['High and low point tolerance', formatQuantity('depth', s.airPointToleranceM, u.system)],
    ...(s.heightScatterM > 0
      ? [
          [
            'Survey height scatter',
            `${formatQuantity('depth', s.heightScatterM, u.system)} (the route's stated height accuracy): highs, lows and limit ranges are read no finer than this`,
          ] as [string, string],
        ]
      : []),
    [
      'Siphon limit / vapour limit',
      `${formatQuantity('length', a.limits.siphonLimitHeadM, u.system)} / ${formatQuantity('length', a.limits.vapourLimitHeadM, u.system)} of suction at ${formatQuantity('elevation', a.limits.siteAltitudeM, u.system)} altitude`,
    ],
    ['Surge check', s.checkSurge ? 'static pressure plus a sudden stop (Joukowsky) against the allowed head' : 'off'],
    [
      'Flow analysed',
      `${formatQuantity('designFlow', a.flowM3s, u.system)} (${a.flowSource === 'design' ? 'design flow' : 'found by gravity between the fixed ends'})`,
    ],
  ];
  table(
    doc,
    [
      { heading: 'Assumption', width: 200 },
      { heading: 'Value', width: 562 },
    ],
    rows.map(([k, v]) => [k, v]),
  );
  const pipes = [...new Map(a.stretches.map((st) => [st.pipe.id, st.pipe])).values()];
  table(
    doc,
    [
      { heading: 'Pipe', width: 200 },
      { heading: 'Hazen-Williams C', width: 80, align: 'right' },
      { heading: 'Roughness', width: 80, align: 'right' },
      { heading: 'Wave speed', width: 80, align: 'right' },
      { heading: 'Source of figures', width: 322 },
    ],
    pipes.map((p) => [
      p.label,
      formatNumber(p.hazenWilliamsC, 0),
      `${Number(toDisplay('diameter', p.roughnessM, u.system).toPrecision(2))} ${u.diameter}`,
      `${formatNumber(toDisplay('velocity', p.waveSpeedMs, u.system), 0)} ${u.velocity}`,
      p.source,
    ]),
  );
  doc
    .font('Helvetica')
    .fontSize(8)
    .fillColor(INK)
    .text(
      `Defaults where the line sets none: velocity band ${DEFAULT_LINE_SETTINGS.velocityMinMs}-${DEFAULT_LINE_SETTINGS.velocityMaxMs} m/s (T.D. Jordan Jr., A Handbook of Gravity-Flow Water Systems, p.53); ` +
        `residual at an outlet ${DEFAULT_LINE_SETTINGS.minResidualHeadM} m (Akvopedia, gravity-fed water supply); practical siphon limit ${DEFAULT_LINE_SETTINGS.siphonLimitHeadM} m ` +
        'at sea level (Taylor & Francis/CRC hydraulics textbook, ch. 42), kept as the same share of the site\u2019s atmospheric head at altitude. Pipe ratings are the standards\u2019 pressure classes, which already contain their design factors.',
    );
}

export function cautions(doc: Doc): void {
  heading(doc, 'Cautions');
  for (const c of LINE_CAUTIONS) {
    doc
      .font('Helvetica-Bold')
      .fontSize(9)
      .fillColor(INK)
      .text(`${c.title}. `, { continued: true })
      .font('Helvetica')
      .text(pdfText(c.text));
    doc.moveDown(0.3);
  }
}
