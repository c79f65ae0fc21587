import { describe, expect, it } from 'vitest';
import type { Study } from '../../../api/engine/model.ts';
import { mapFrame } from '../../../web/maps/map-frame.ts';
import { StudyMap } from '../../../web/maps/study-map.tsx';
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
    ['en', '20 km deep'],
    ['fr', 'à 20 km de profondeur'],
  ] as const) {
    it(`labels each contour below the top with its depth (${lang})`, () => {
      const frame = mapFrame(study, { width: 600, maxHeight: 400, padding: 20 });
      const svg = String(StudyMap({ tr: translator(lang), study, frame, idPrefix: 't' }));
      expect(svg.match(/class="map-contour"/g)).toHaveLength(2);
      expect(svg).toContain('data-depth-km="35"');
      expect(svg).toContain(label);
    });
  }
});
