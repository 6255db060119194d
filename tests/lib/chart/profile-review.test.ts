import { describe, expect, it } from 'vitest';
import { analyzeLine } from '../../../hydraulics/index';
import { profileScene } from '../../../lib/chart/profile-scene';
import { svgToString } from '../../../lib/chart/svg-node';
import { revisionStamp, workingCopyStamp } from '../../../lib/review/stamp';
import { displayUnits } from '../../../lib/units/index';
import { referenceLine } from '../../lines/reference-line';

const analysis = analyzeLine(referenceLine());
const units = displayUnits('metric');
const draw = (options: Partial<Parameters<typeof profileScene>[1]>) =>
  svgToString(profileScene(analysis, { units, devices: [], width: 1000, ...options }).root);

describe('review layers of the long profile', () => {
  it('marks anything not approved "not for construction", and an approved revision not', () => {
    const working = draw({ stamp: workingCopyStamp('Tobias Wren') });
    expect(working).toContain('data-layer="review-stamp"');
    expect(working).toContain('data-role="not-for-construction"');
    expect(working).toContain('Working copy');
    const submitted = draw({
      stamp: revisionStamp({
        number: 4,
        status: 'submitted',
        designerName: 'Tobias Wren',
        reviewerName: null,
        reviewedAt: null,
      }),
    });
    expect(submitted).toContain('NOT FOR CONSTRUCTION');
    const approved = draw({
      stamp: revisionStamp({
        number: 5,
        status: 'approved',
        designerName: 'Tobias Wren',
        reviewerName: 'Dara Okafor',
        reviewedAt: '2026-12-02T10:00:00.000Z',
      }),
    });
    expect(approved).not.toContain('NOT FOR CONSTRUCTION');
    expect(approved).toContain(
      'Revision 5 · Approved · designer Tobias Wren · reviewer Dara Okafor · approved 2026-12-02',
    );
    const superseded = revisionStamp({
      number: 3,
      status: 'superseded',
      designerName: null,
      reviewerName: 'Dara Okafor',
      reviewedAt: '2026-11-02T10:00:00.000Z',
    });
    expect(superseded).toMatchObject({
      forConstruction: false,
      approvedOn: '2026-11-02',
      markReason: 'superseded by a later revision',
    });
  });

  it('draws each comment pin at its chainage on the same x scale as the profile, and leaves out pins outside the view', () => {
    const scene = profileScene(
      analysis,
      {
        units,
        devices: [],
        width: 1000,
        view: { fromM: 0, toM: 700 },
        pins: [
          { id: 'a', chainageM: 650, label: '1', resolved: false },
          { id: 'b', chainageM: 900, label: '2', resolved: true },
        ],
      },
      'test',
    );
    const svg = svgToString(scene.root);
    expect(svg).toContain('data-comment-id="a"');
    expect(svg).not.toContain('data-comment-id="b"');
    const x = Math.round(scene.frame.x(650) * 100) / 100;
    expect(svg).toMatch(new RegExp(`data-comment-id="a"[^>]*><title>[^<]*</title><line x1="${x}"`));
  });

  it('draws an earlier grade line only when one is given', () => {
    expect(draw({})).not.toContain('data-layer="earlier-grade"');
    const withEarlier = draw({
      earlierGrade: {
        label: 'Revision 1',
        chainageM: analysis.points.chainageM,
        gradeM: analysis.points.hydraulicGradeM,
      },
    });
    expect(withEarlier).toContain('data-layer="earlier-grade"');
  });
});
