import { readFileSync } from 'node:fs';
import { describe, expect, test } from 'vitest';
import { feltHistory } from '../../../api/engine/catalog/felt-history.ts';
import { modelCatalog } from '../../../api/engine/motion/registry.ts';
import { parseCatalog } from '../../../api/catalog/index.ts';
import { DEMO_STUDY_URL } from '../../../api/operations/demo-seed.ts';
import { loadStudy } from '../../../api/study/load-study.ts';
import { translator } from '../../../web/text/translator.ts';
import { FeltList, strongestFelt } from '../../../web/views/felt-list.tsx';

// How the community page lists "earthquakes people here have likely felt": the numbers are the
// engine's feltHistory (tested in test/engine/catalog/felt-history.test.ts); this checks the list
// shows them, strongest first. The demo data are invented and are not check values of a computation.
const loaded = loadStudy(JSON.parse(readFileSync(DEMO_STUDY_URL, 'utf8')), {
  models: modelCatalog,
});
if (!loaded.ok) throw new Error('the demo study does not load');
const catalog = parseCatalog(
  readFileSync(new URL('../../../data-demo/catalog.csv', import.meta.url), 'utf8'),
);
const history = feltHistory(loaded.study, catalog.events, { models: modelCatalog });
const en = translator('en');

describe('the felt list', () => {
  const vennick = history.communities.find((c) => c.communityId === 'vennick-bay');
  test('shows the counts and the strongest events first, each with date, magnitude, place and intensity', () => {
    expect(vennick).toBeDefined();
    if (!vennick) return;
    expect(vennick.felt.length).toBeGreaterThan(0);
    const html = String(
      FeltList({
        tr: en,
        studyId: 's',
        communityName: 'Vennick Bay',
        felt: { history: vennick, eventCount: history.eventCount },
        limit: 5,
        headingLevel: 2,
      }),
    );
    expect(html).toContain(
      `data-felt="${vennick.felt.length}" data-strongly-felt="${vennick.stronglyFelt.length}"`,
    );
    const shown = [...html.matchAll(/<tr data-event="([^"]+)">/g)].map((m) => m[1]);
    const strongest = strongestFelt(vennick, 5);
    expect(shown).toEqual(strongest.map((e) => e.eventId));
    for (let i = 1; i < strongest.length; i++)
      expect(strongest[i - 1]!.mmi).toBeGreaterThanOrEqual(strongest[i]!.mmi);
    const first = strongest[0]!;
    expect(html).toContain(
      `<td class="numeric">M ${en.number(first.magnitude, 1)}</td><td>${en.place(first.distanceKm, first.bearingDeg)}</td>`,
    );
  });

  test('without a catalog it says so and points to the catalog view', () => {
    const html = String(
      FeltList({ tr: en, studyId: 's1', communityName: 'X', limit: 5, headingLevel: 2 }),
    );
    expect(html).toContain(en.t('community.feltNoCatalog'));
    expect(html).toContain('href="/studies/s1/catalog"');
  });
});
