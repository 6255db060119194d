import fs from 'node:fs';
import { analyzeLine, applyLineFixes } from './hydraulics/index';
import { profileScene } from './lib/chart/profile-scene';
import { standaloneSvg } from './lib/chart/svg-node';
import { displayUnits } from './lib/units/display';
import { referenceLine } from './tests/lines/reference-line';
let input = referenceLine();
if (process.argv[2] === 'fix') { const a0 = analyzeLine(input); input = applyLineFixes(input, a0.warnings.find(w => w.code === 'static-over-rating')!.fixes); }
const a = analyzeLine(input);
const scene = profileScene(a, { units: displayUnits((process.argv[3] as 'us') ?? 'metric'), devices: input.devices ?? [], title: 'Spring box to house', highlight: { fromM: 500, toM: 700 } });
fs.writeFileSync('/tmp/lines-scratch/profile.svg', standaloneSvg(scene.root));
console.log(scene.drawnIndices.length, scene.frame.height);
