import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { modelCatalog } from '../../api/engine/motion/registry.ts';
import { loadStudy } from '../../api/study/load-study.ts';
import { type Doc, studyDocArb } from './arbitrary-study.ts';

/**
 * The study schemas (api/study/, zod) on generated documents: every valid document is
 * accepted, and every document broken in one known way is refused with an issue at the path
 * of the broken field (DESIGN.md section 2 names the paths). The breakages are the user's
 * usual mistakes: wrong types, out-of-range numbers, NaN and Infinity spelled as strings,
 * missing fields, unknown enumerations, duplicate ids, weights that do not sum to 1.
 */

const RUNS = 150;
const SEED = 20_110_311;

const figures: string[] = [];
afterAll(() => console.log(`schema properties (seed ${SEED}): ${figures.join('; ')}`));

/** A value of the wrong kind for a number field. */
const notANumber = fc.constantFrom<unknown>(
  'NaN',
  'Infinity',
  '-Infinity',
  '12',
  '',
  null,
  true,
  [],
  {},
  '1e999',
);

/** One way to break a valid document: the change, and the path the refusal must name. */
interface Breakage {
  readonly what: string;
  readonly path: string;
  apply(doc: Doc): void;
}

/**
 * Breakages of `doc`, each on an element of it that exists. Paths are those formatPath gives
 * (api/study/issues.ts): `communities[0].lat`, `sources.features[1].properties.dip`.
 */
function breakageArb(doc: Doc): fc.Arbitrary<Breakage> {
  const communities = doc.communities as Doc[];
  const features = doc.sources.features as Doc[];
  const ci = fc.integer({ min: 0, max: communities.length - 1 });
  const fi = fc.integer({ min: 0, max: features.length - 1 });
  const options: fc.Arbitrary<Breakage>[] = [
    fc
      .tuple(
        ci,
        fc.oneof(
          fc.double({ min: 90.000001, max: 1e300, noNaN: true }),
          fc.double({ min: -1e300, max: -90.000001, noNaN: true }),
          notANumber,
        ),
      )
      .map(([i, lat]) => ({
        what: `community lat ${String(lat)}`,
        path: `communities[${i}].lat`,
        apply: (d: Doc) => void (d.communities[i].lat = lat),
      })),
    fc
      .tuple(ci, fc.oneof(fc.double({ min: 180.000001, max: 1e300, noNaN: true }), notANumber))
      .map(([i, lon]) => ({
        what: `community lon ${String(lon)}`,
        path: `communities[${i}].lon`,
        apply: (d: Doc) => void (d.communities[i].lon = lon),
      })),
    fc
      .tuple(
        ci,
        fc.oneof(
          fc.double({ min: -1e6, max: 49.99, noNaN: true }),
          fc.double({ min: 5000.01, max: 1e12, noNaN: true }),
          notANumber,
        ),
      )
      .map(([i, vs30]) => ({
        what: `vs30 ${String(vs30)}`,
        path: `communities[${i}].vs30`,
        apply: (d: Doc) => {
          delete d.communities[i].siteClass;
          d.communities[i].vs30 = vs30;
        },
      })),
    fc.tuple(ci, fc.constantFrom('id', 'name', 'lon', 'lat')).map(([i, key]) => ({
      what: `community without ${key}`,
      path: `communities[${i}].${key}`,
      apply: (d: Doc) => void delete d.communities[i][key],
    })),
    fc
      .tuple(ci, fc.constantFrom('has space', '-leading', '', 'x'.repeat(65), '<b>', 7))
      .map(([i, id]) => ({
        what: `community id ${JSON.stringify(id)}`,
        path: `communities[${i}].id`,
        apply: (d: Doc) => void (d.communities[i].id = id),
      })),
    fi.map((i) => ({
      what: 'unknown tectonic setting',
      path: `sources.features[${i}].properties.setting`,
      apply: (d: Doc) => void (d.sources.features[i].properties.setting = 'volcanic'),
    })),
    fc.tuple(fi, fc.constantFrom<unknown>('poisson', 7, null, undefined)).map(([i, type]) => ({
      what: `recurrence type ${String(type)}`,
      path: `sources.features[${i}].properties.recurrence.type`,
      apply: (d: Doc) => void (d.sources.features[i].properties.recurrence.type = type),
    })),
    fc
      .tuple(
        fi,
        fc.oneof(
          fc.double({ min: 200.01, max: 1e300, noNaN: true }),
          fc.double({ min: -1e300, max: -200.01, noNaN: true }),
        ),
      )
      .map(([i, lon]) => ({
        what: `source longitude ${lon}`,
        path: `sources.features[${i}].geometry.coordinates`,
        apply: (d: Doc) => {
          const g = d.sources.features[i].geometry;
          if (g.type === 'Point') g.coordinates[0] = lon;
          else if (g.type === 'LineString') g.coordinates[0][0] = lon;
          else g.coordinates[0][1][0] = lon;
        },
      })),
    fc.tuple(fi, fc.constantFrom<unknown>('Point', 'MultiPoint', null, 3)).map(([i, type]) => ({
      what: `geometry type ${String(type)} without coordinates`,
      path: `sources.features[${i}].geometry`,
      apply: (d: Doc) =>
        void (d.sources.features[i].geometry =
          type === 'Point' ? { type } : { type, coordinates: [] }),
    })),
    fi.map((i) => ({
      what: 'duplicate source id',
      path: `sources.features[${i === 0 ? features.length : i}].properties.id`,
      apply: (d: Doc) => {
        if (i === 0) d.sources.features.push(structuredClone(d.sources.features[0]));
        else d.sources.features[i].properties.id = d.sources.features[0].properties.id;
      },
    })),
    ci.map((i) => ({
      what: 'duplicate community id',
      path: `communities[${i === 0 ? communities.length : i}].id`,
      apply: (d: Doc) => {
        if (i === 0) d.communities.push(structuredClone(d.communities[0]));
        else d.communities[i].id = d.communities[0].id;
      },
    })),
    fc
      .oneof(
        fc.double({ min: 6.01, max: 1e300, noNaN: true }),
        fc.double({ min: -1e300, max: -0.01, noNaN: true }),
        notANumber,
      )
      .map((t) => ({
        what: `truncationSigma ${String(t)}`,
        path: 'settings.truncationSigma',
        apply: (d: Doc) => void (d.settings.truncationSigma = t),
      })),
    fc.constantFrom<unknown>([], 'PGA', [7], ['SA(-1)'], ['PGA', 'PGA'], ['MMI']).map((m) => ({
      what: `measures ${JSON.stringify(m)}`,
      path: 'settings.measures',
      apply: (d: Doc) => void (d.settings.measures = m),
    })),
    fc.double({ min: 0.01, max: 0.99, noNaN: true }).map((w) => ({
      what: `weights summing to ${w}`,
      path: 'groundMotion.crustal',
      apply: (d: Doc) => {
        d.groundMotion.crustal = [
          { model: d.groundMotion.crustal[0].model, weight: Number(w.toFixed(3)) },
        ];
      },
    })),
    fc.constant({
      what: 'unknown model',
      path: 'groundMotion.crustal[0].model',
      apply: (d: Doc) => void (d.groundMotion.crustal = [{ model: 'NoSuchModel', weight: 1 }]),
    }),
    fc.constantFrom<unknown>('', '   ', 42, null, 'n'.repeat(201)).map((name) => ({
      what: `study name ${JSON.stringify(name)?.slice(0, 20)}`,
      path: 'name',
      apply: (d: Doc) => void (d.name = name),
    })),
    fc.constantFrom<unknown>([], null, 7, {}).map((c) => ({
      what: `communities ${JSON.stringify(c)}`,
      path: 'communities',
      apply: (d: Doc) => void (d.communities = c),
    })),
  ];
  const faults = features
    .map((f, i) => [f, i] as const)
    .filter(([f]) => f.geometry.type === 'LineString');
  if (faults.length > 0) {
    options.push(
      fc
        .tuple(
          fc.constantFrom(...faults.map(([, i]) => i)),
          fc.oneof(fc.constantFrom<unknown>(0, -10, 90.5, 1e9, 'steep'), notANumber),
        )
        .map(([i, dip]) => ({
          what: `dip ${String(dip)}`,
          path: `sources.features[${i}].properties.dip`,
          apply: (d: Doc) => void (d.sources.features[i].properties.dip = dip),
        })),
    );
  }
  return fc.oneof(...options);
}

describe('the study schemas on generated documents', () => {
  it('accept every valid document, with no issue', () => {
    let accepted = 0;
    fc.assert(
      fc.property(studyDocArb({ maxCommunities: 4, maxSources: 4 }), (doc) => {
        const loaded = loadStudy(doc, { models: modelCatalog });
        expect(loaded.ok ? [] : loaded.issues).toEqual([]);
        accepted++;
      }),
      { numRuns: RUNS, seed: SEED },
    );
    figures.push(`${accepted} valid documents accepted`);
  });

  it('refuse every broken document with an issue at the broken field', () => {
    const byKind = new Map<string, number>();
    fc.assert(
      fc.property(
        studyDocArb({ maxCommunities: 4, maxSources: 4 }).chain((doc) =>
          fc.tuple(fc.constant(doc), breakageArb(doc)),
        ),
        ([doc, breakage]) => {
          const broken = structuredClone(doc);
          breakage.apply(broken);
          // Through JSON, as the service receives it (undefined keys drop out).
          const loaded = loadStudy(JSON.parse(JSON.stringify(broken)), { models: modelCatalog });
          expect(loaded.ok, `${breakage.what} was accepted`).toBe(false);
          if (loaded.ok) return;
          for (const issue of loaded.issues) {
            expect(issue.path.length, JSON.stringify(issue)).toBeGreaterThan(0);
            expect(issue.message.length, JSON.stringify(issue)).toBeGreaterThan(0);
          }
          const paths = loaded.issues.map((i) => i.path);
          expect(
            paths.some(
              (p) =>
                p === breakage.path ||
                p.startsWith(`${breakage.path}.`) ||
                p.startsWith(`${breakage.path}[`),
            ),
            `${breakage.what}: expected an issue at ${breakage.path}, got ${JSON.stringify(loaded.issues)}`,
          ).toBe(true);
          const kind = breakage.path.replace(/\[\d+\]/g, '[]');
          byKind.set(kind, (byKind.get(kind) ?? 0) + 1);
        },
      ),
      { numRuns: RUNS * 2, seed: SEED },
    );
    const total = [...byKind.values()].reduce((a, b) => a + b, 0);
    figures.push(
      `${total} broken documents refused at the broken path, over ${byKind.size} kinds of breakage`,
    );
    expect(byKind.size).toBeGreaterThan(10);
  });
});
