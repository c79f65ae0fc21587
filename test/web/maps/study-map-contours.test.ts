import { describe, expect, it } from 'vitest';
import type { Study } from '../../../api/engine/model.ts';
import { mapFrame } from '../../../web/maps/map-frame.ts';
import { StudyMap, StudyMapLegend } from '../../../web/maps/study-map.tsx';
import { translator } from '../../../web/text/translator.ts';
import { contouredKm } from '../../engine/geometry/km-fixtures.ts';

/** The study map draws a contoured fault's deeper contours with their depths (invented data). */
describe('a contoured fault on the study map', () => {
  const slab = contouredKm(
    [5, 20, 35].map((d): [number, number][] => [
      [d, 0],
      [d + 2, 80],
    ]),
    [5, 20, 35],
    { dipDeg: 30, dipDirectionDeg: 90, id: 'slab-top', setting: 'interface' },
  );
  const study = {
    name: 'Map',
    communities: [],
    sources: [slab],
  } as unknown as Study;

  for (const [lang, label] of [
    ['en', (d: number) => `${d} km deep`],
    ['fr', (d: number) => `à ${d} km de profondeur`],
  ] as const) {
    it(`draws one dotted path per contour below the top (the top is the trace) and labels every contour with its depth (${lang})`, () => {
      const frame = mapFrame(study, { width: 600, maxHeight: 400, padding: 20 });
      const svg = String(StudyMap({ tr: translator(lang), study, frame, idPrefix: 't' }));
      const groups = [
        ...svg.matchAll(/<g class="(map-contour(?:-top)?)" data-depth-km="(\d+)">([\s\S]*?)<\/g>/g),
      ];
      expect(groups.map((g) => [g[1], Number(g[2])])).toEqual([
        ['map-contour-top', 5],
        ['map-contour', 20],
        ['map-contour', 35],
      ]);
      for (const [, kind, depth, inner] of groups) {
        expect((inner as string).match(/<path /g) ?? []).toHaveLength(
          kind === 'map-contour' ? 1 : 0,
        );
        expect(inner).toContain(`>${label(Number(depth))}</text>`);
      }
    });
  }

  it('explains the dotted contours in the legend', () => {
    const svg = String(
      StudyMapLegend({ tr: translator('en'), idPrefix: 't', bands: false, study }),
    );
    expect(svg).toContain('Depth contour of a fault or interface, with its depth');
  });
});
