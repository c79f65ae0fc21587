import { describe, expect, test } from 'vitest';
import type { Community } from '../../../api/engine/model.ts';
import { SUGGESTED_CELLS_ACROSS, suggestedMapSpacing } from '../../../web/data/map-spacing.ts';
import { expectClose } from '../../helpers/close.ts';

/**
 * The spacing the overview's form suggests: the longer side of the study area over
 * SUGGESTED_CELLS_ACROSS (24), rounded up to a whole km, 1 km at the finest (a rule of ours;
 * common practice has no single value). The sides are measured in the study's local frame,
 * so a north–south study's side is its meridian arc.
 */
const village = (id: string, lon: number, lat: number): Community => ({
  id,
  name: id,
  lon,
  lat,
  vs30: 760,
  vs30Basis: 'measured',
  coastal: false,
});

describe('suggestedMapSpacing', () => {
  test('two villages half a degree apart on one meridian near 47° S: a side of 56 km and 3 km cells', () => {
    // Meridian arc of 0.5° centred on 47.25° S: 0.5 × 111.17 km = 55.6 km, from the WGS84 meridian
    // radius of curvature a(1 − e²)/(1 − e² sin²φ)^(3/2) (Snyder 1987, Map Projections — A Working
    // Manual, eq. 4-18; from memory). Rounded up to a whole km: 56; 56 / 24 rounded up: 3 km.
    const spacing = suggestedMapSpacing({
      communities: [village('a', -140.2, -47.0), village('b', -140.2, -47.5)],
      sources: [],
    });
    expect(spacing).toEqual({ spacingKm: 3, spanKm: 56, cellsAcross: SUGGESTED_CELLS_ACROSS });
  });

  test('ten degrees of latitude: a side of about 1,112 km and 47 km cells', () => {
    // 10° of meridian arc between 42° and 52° S, 111.04 to 111.27 km a degree (same formula, from memory).
    const spacing = suggestedMapSpacing({
      communities: [village('a', -140.2, -42), village('b', -140.2, -52)],
      sources: [],
    });
    expectClose(
      spacing.spanKm,
      1112,
      2,
      'meridian arc 42–52° S on WGS84 (Snyder 1987 eq. 4-18, from memory), rounded up',
    );
    expect(spacing.spacingKm).toBe(47);
  });

  test('a study of one place gets the finest spacing, 1 km', () => {
    expect(
      suggestedMapSpacing({ communities: [village('a', -140.2, -47.4)], sources: [] }),
    ).toEqual({ spacingKm: 1, spanKm: 0, cellsAcross: SUGGESTED_CELLS_ACROSS });
  });
});
