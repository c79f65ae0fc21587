import { studyRuptureTable } from '../../api/engine/hazard/study-rupture-table.ts';
import type { FaultSource, Study } from '../../api/engine/model.ts';
import { screenStudy } from '../../api/engine/screen-study.ts';
import { FRAME, arcKm, contouredKm, faultKm } from '../engine/geometry/km-fixtures.ts';
import { largestDifference, loadLine, machineLine } from './hazard-cases.ts';
import { testSettings } from '../helpers/test-settings.ts';

/**
 * The cost of a fault given by depth contours against the same fault as a plane: an invented
 * interface 200 km long dipping 20° from 5 to 45 km, screened at five sites (PGA, the default
 * interface models' two main branches), as a plane, as that plane's contours, and as a slab
 * that steepens with depth and bends in plan (contours are arcs). Prints the rupture and plane
 * counts, the time to build the rupture table and to screen, and how far the contoured plane's
 * hazard curves lie from the plane's. Asserts nothing about time.
 *
 *   npm run bench -- contoured
 */
const TAN_20 = Math.tan((20 * Math.PI) / 180);
const RECURRENCE = { type: 'gutenberg-richter', bValue: 1, mMin: 6, mMax: 8.5, rate: 0.1 } as const;
const OPTIONS = {
  dipDeg: 20,
  dipDirectionDeg: 90,
  setting: 'interface',
  mechanism: 'reverse',
  recurrence: RECURRENCE,
} as const;

const planar: FaultSource = {
  ...faultKm(
    [
      [0, 0],
      [0, 200],
    ],
    { ...OPTIONS, upperDepthKm: 5, lowerDepthKm: 45 },
  ),
  rakeDeg: 90,
};
const planeDepths = [5, 15, 25, 35, 45];
const contouredPlane: FaultSource = {
  ...contouredKm(
    planeDepths.map((d): [number, number][] => [
      [(d - 5) / TAN_20, 0],
      [(d - 5) / TAN_20, 200],
    ]),
    planeDepths,
    OPTIONS,
  ),
  rakeDeg: 90,
};
// In section a circle of radius 150 km about an axis 155 km deep; in plan arcs about a point
// 300 km west (plain geometry, invented).
const slabDepths = [5, 10, 15, 20, 25, 30, 35, 40, 45];
const offsetKm = (d: number) => 150 * Math.sin(Math.acos((155 - d) / 150));
const arc = (radiusKm: number) => arcKm([-300, 100], radiusKm, -19, 0.475);
const bentSlab: FaultSource = {
  ...contouredKm(
    slabDepths.map((d) => arc(300 + offsetKm(d))),
    slabDepths,
    OPTIONS,
  ),
  rakeDeg: 90,
};

function study(source: FaultSource): Study {
  const sites = [
    [-30, 100],
    [20, 100],
    [60, 150],
    [100, 40],
    [150, 100],
  ];
  return {
    name: 'Contoured benchmark',
    communities: sites.map(([x, y], i) => {
      const [lon, lat] = FRAME.toLonLat({ x: x!, y: y! });
      return {
        id: `s${i}`,
        name: `S${i}`,
        lon,
        lat,
        vs30: 400,
        vs30Basis: 'measured',
        coastal: false,
      };
    }),
    sources: [source],
    groundMotion: {
      crustal: [{ model: 'BSSA14', weight: 1 }],
      interface: [
        { model: 'AGA16', weight: 0.6 },
        { model: 'Zhao06', weight: 0.4 },
      ],
      intraslab: [{ model: 'AGA16', weight: 1 }],
    },
    settings: testSettings(),
  };
}

const time = <T>(work: () => T): { value: T; seconds: number } => {
  const start = performance.now();
  const value = work();
  return { value, seconds: (performance.now() - start) / 1000 };
};

console.log(`Tremora contoured-source benchmark, ${new Date().toISOString().slice(0, 10)}`);
console.log(`machine: ${machineLine()}`);
console.log(`${loadLine()} at the start (other work on the machine slows every figure)`);
console.log('case                 ruptures    planes   table s  screen s');
const results = new Map<string, ReturnType<typeof screenStudy>>();
for (const [label, source] of [
  ['plane', planar],
  ['plane as contours', contouredPlane],
  ['bent slab contours', bentSlab],
] as const) {
  const s = study(source);
  const built = time(() => studyRuptureTable(s).table);
  const screened = time(() => screenStudy(s));
  results.set(label, screened.value);
  const planes = built.value.planeStart[built.value.count] as number;
  console.log(
    `${label.padEnd(20)} ${String(built.value.count).padStart(8)} ${String(planes).padStart(9)} ${built.seconds.toFixed(2).padStart(9)} ${screened.seconds.toFixed(2).padStart(9)}`,
  );
}
const a = results.get('plane')!;
const b = results.get('plane as contours')!;
const worst = Math.max(
  ...a.communities.map((c, i) =>
    largestDifference(b.communities[i]!.curves.PGA!.annualRate, c.curves.PGA!.annualRate),
  ),
);
console.log(
  `plane as contours against the plane: largest relative difference of a PGA rate ${worst.toExponential(2)}`,
);
