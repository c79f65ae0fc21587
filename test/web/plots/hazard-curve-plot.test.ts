import { describe, expect, test } from 'vitest';
import type { HazardCurve } from '../../../api/engine/results.ts';
import { HazardCurveLegend, HazardCurvePlot } from '../../../web/plots/hazard-curve-plot.tsx';
import { translator } from '../../../web/text/translator.ts';

// The fractile curves of the logic tree drawn beside the mean. The rates are made up for the
// drawing (each fractile below or above the mean at every level); the fractiles themselves are
// computed and tested in test/engine/hazard/.
const en = translator('en');
const curve: HazardCurve = {
  levels: [0.01, 0.1, 1],
  annualRate: [1e-1, 1e-2, 1e-4],
  fractiles: { '0.16': [5e-2, 5e-3, 5e-5], '0.84': [2e-1, 2e-2, 3e-4] },
};

const plot = (c: HazardCurve): string =>
  String(
    HazardCurvePlot({
      tr: en,
      curve: c,
      returnPeriodsYears: [475],
      levelsAtReturnPeriods: { '475': 0.2 },
      idPrefix: 'test',
    }),
  );

/** The [x, y] points of an SVG path's d attribute (M and L commands only, as d3-shape writes a line). */
function pointsOf(svg: string, marker: string): [number, number][] {
  const match =
    new RegExp(`<path[^>]*d="([^"]*)"[^>]*${marker}`).exec(svg) ??
    new RegExp(`<path[^>]*${marker}[^>]*d="([^"]*)"`).exec(svg);
  if (!match) throw new Error(`no path with ${marker}`);
  return [...match[1]!.matchAll(/[ML]([-\d.]+),([-\d.]+)/g)].map((m) => [
    Number(m[1]),
    Number(m[2]),
  ]);
}

describe('the hazard-curve plot', () => {
  test('draws each fractile curve of the logic tree, dotted, on the side of the mean its rates lie', () => {
    const svg = plot(curve);
    const mean = pointsOf(svg, 'class="mean-curve"');
    const low = pointsOf(svg, 'data-fractile="0.16"');
    const high = pointsOf(svg, 'data-fractile="0.84"');
    expect(mean).toHaveLength(3);
    expect(low).toHaveLength(3);
    expect(high).toHaveLength(3);
    for (let i = 0; i < 3; i++) {
      // Same level, same x (to the 0.1 px the path is written to).
      expect(low[i]![0]).toBeCloseTo(mean[i]![0], 1);
      // Lower rates sit lower on the plot: a larger y in SVG coordinates.
      expect(low[i]![1]).toBeGreaterThan(mean[i]![1]);
      expect(high[i]![1]).toBeLessThan(mean[i]![1]);
    }
    // Dotted, one path per fractile, so they read apart from the mean in greyscale.
    expect(svg.match(/stroke-dasharray="1.5 3"/g)).toHaveLength(2);
  });

  test('draws no fractile path when the curve has none', () => {
    const { fractiles: _omitted, ...plain } = curve;
    expect(plot(plain)).not.toContain('data-fractile');
  });

  test('the legend names the fractiles drawn, and only when there are some', () => {
    const legend = String(HazardCurveLegend({ tr: en, branches: 4, fractiles: ['0.16', '0.84'] }));
    expect(legend).toContain('Fractile curves of the logic tree (16%, 84%)');
    expect(String(HazardCurveLegend({ tr: en, branches: 4 }))).not.toContain('Fractile');
  });
});
