import { DOMParser, type Element } from '@xmldom/xmldom';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import type { TextKey } from '../../../web/text/text-key.ts';
import { translator } from '../../../web/text/translator.ts';
import { cutDownDemo } from '../helpers/cut-down-demo.ts';
import { saveAndScreen, startPageApp, type PageApp } from '../helpers/page-app.ts';

/**
 * Session material through app.request(), on a cut-down demo (two villages, the interface
 * and two crustal faults, PGA only) so a screening is quick: the handout's village map,
 * intensity sentence and picture strip with no planner's label; the A3 poster; the pictures
 * for slides as SVG and PNG.
 */
let page: PageApp;
let id: string;
const en = translator('en');
const SOURCES = ['orle-interface', 'vennick-fault', 'pellow-thrust'];

beforeAll(async () => {
  page = startPageApp();
  const study = cutDownDemo('Demo coast, material', ['harbour-point', 'vennick-bay'], SOURCES);
  ({ id } = await saveAndScreen(page, study));
}, 120_000);
afterAll(async () => page?.close());

const get = (path: string) => page.app.request(path);
const html = async (path: string, status = 200) => {
  const response = await get(path);
  expect(response.status).toBe(status);
  return response.text();
};
const community = (cid: string) => `/studies/${id}/communities/${cid}`;

/** Every screening band's name and meaning: a planner's words, never on residents' material. */
const BANDS = ['refer-first', 'refer-soon', 'prepare', 'inform'] as const;
const PLANNER_WORDS = [
  en.t('band.label'),
  ...BANDS.flatMap((band) => [en.t(`band.${band}`), en.t(`band.${band}.meaning`)]),
];

/** The root of an SVG file parsed as XML; a parse error fails the test with its message. */
function parseSvg(text: string): Element {
  const errors: string[] = [];
  const doc = new DOMParser({
    onError: (level, message) => {
      if (level !== 'warning') errors.push(message);
    },
  }).parseFromString(text, 'image/svg+xml');
  expect(errors).toEqual([]);
  const root = doc.documentElement;
  if (!root) throw new Error('expected an SVG document with a root element');
  expect(root.tagName).toBe('svg');
  expect(root.getAttribute('xmlns')).toBe('http://www.w3.org/2000/svg');
  return root;
}

/** Width and height of a PNG from its IHDR chunk (PNG spec, ISO/IEC 15948:2004, 11.2.2). */
function pngSize(bytes: Buffer): { width: number; height: number } {
  return { width: bytes.readUInt32BE(16), height: bytes.readUInt32BE(20) };
}
const PNG_SIGNATURE = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);

describe('the handout', () => {
  test('shows no band or referral wording to residents', async () => {
    expect(PLANNER_WORDS).toContain('Refer soon');
    for (const cid of ['harbour-point', 'vennick-bay']) {
      const text = await html(`${community(cid)}/handout`);
      for (const words of PLANNER_WORDS) expect(text, `${cid}: "${words}"`).not.toContain(words);
      expect(text).not.toContain('class="band-line"');
      expect(text).not.toContain('band-swatch');
    }
  });

  test('has the village map with the faults and the plate boundary, in lines and in words', async () => {
    const text = await html(`${community('harbour-point')}/handout`);
    expect(text).toContain(
      `<h2 id="village-map-heading">${en.t('material.mapHeading', { name: 'Harbour Point' })}</h2>`,
    );
    const map = text.slice(
      text.indexOf('<svg class="map"'),
      text.indexOf('</svg>', text.indexOf('<svg class="map"')),
    );
    // The nearest crustal fault drawn and named; the plate boundary, beyond this small map,
    // pointed at from its edge by a dashed arrow, drawn as the interface is, with its distance.
    expect(map).toContain('<g data-source="vennick-fault">');
    expect(map).toMatch(/class="map-label map-label-source"[^>]*>Vennick Fault</);
    expect(map).not.toContain('data-source="orle-interface"');
    const pointer = /<g class="boundary-pointer" data-bearing-deg="(\d+)">/.exec(map);
    // The demo trench runs north–south west of the coast (data-demo/demo.study.json).
    expect(Math.abs(Number(pointer?.[1]) - 270)).toBeLessThanOrEqual(30);
    expect(map).toContain('stroke-dasharray="10 4"');
    expect(map).toMatch(/>Plate boundary, \d+ km this way</);
    // Scale bar and north arrow; the village itself, larger and in bold.
    expect(map).toContain('class="scale-bar"');
    expect(map).toContain('class="north-arrow"');
    expect(map).toMatch(/font-weight="bold"[^>]*>Harbour Point</);
    // No screening band marker: the village is a plain circle.
    expect(map).toContain('<circle');
    expect(text).toMatch(
      /<p class="plate-boundary" data-source="orle-interface">The plate boundary \(Orle Trench interface\) meets the surface \d+ km to the (north|south|east|west|north-east|north-west|south-east|south-west)\.<\/p>/,
    );
  });

  test('explains intensity in one plain sentence and shows a picture per level, IV to VIII', async () => {
    const text = await html(`${community('harbour-point')}/handout`);
    const sentence = en.t('material.intensity');
    expect(sentence.split(/[.!?](\s|$)/).filter((s) => s.trim() !== '').length).toBe(1);
    expect(text).toContain(`<p class="intensity-sentence">${sentence}</p>`);
    expect(text).not.toContain('class="mmi-explain"');
    const strip = text.slice(
      text.indexOf('<ol class="picture-strip">'),
      text.indexOf('</ol>', text.indexOf('<ol class="picture-strip">')),
    );
    expect([...strip.matchAll(/<li data-mmi-level="(\d+)">/g)].map((m) => m[1])).toEqual([
      '4',
      '5',
      '6',
      '7',
      '8',
    ]);
    for (const level of [4, 5, 6, 7, 8]) {
      expect(strip).toContain(`<g class="pictogram" data-mmi-level="${level}">`);
      expect(strip).toContain(en.t(`material.picture.${level}` as TextKey));
    }
    expect(strip).toContain('<strong>MMI IV</strong>');
  });

  test('in French the new words are French', async () => {
    const text = await html(`${community('harbour-point')}/handout?lang=fr`);
    expect(text).toContain('Les failles et la limite des plaques près de Harbour Point');
    expect(text).toContain('Une lampe suspendue se balance.');
  });
});

describe('the poster', () => {
  test('is linked from the community page and sets A3 for print', async () => {
    const page = await html(community('harbour-point'));
    expect(page).toContain(`href="${community('harbour-point')}/poster"`);
    const text = await html(`${community('harbour-point')}/poster`);
    expect(text).toContain('<link rel="stylesheet" href="/static/poster.css"/>');
    const css = await (await get('/static/poster.css')).text();
    expect(css).toMatch(/@page\s*{\s*size: A3 portrait;/);
  });

  test('holds the title, the chance, each level with its words, what to do, the map and the caution; no band', async () => {
    const text = await html(`${community('harbour-point')}/poster`);
    expect(text).toContain(`<h1>${en.t('material.posterTitle', { name: 'Harbour Point' })}</h1>`);
    expect(text).toMatch(
      /<p class="poster-headline" data-probability="[\d.e-]+">The chance of strong shaking/,
    );
    expect(text).toContain(en.t('material.intensity'));
    expect(text).toMatch(/<li data-mmi-level="\d+">/);
    expect(text).toContain(en.t('safety.during').split('\n')[0] as string);
    // Harbour Point is coastal: the tsunami advice is on its poster.
    expect(text).toContain(en.t('tsunami.title'));
    expect(text).toContain('id="poster-map-heading"');
    expect(text).toContain(en.t('caution.short'));
    for (const words of PLANNER_WORDS) expect(text).not.toContain(words);
  });

  test('an unknown community answers 404', async () => {
    await html(`/studies/${id}/communities/no-such-place/poster`, 404);
  });
});

describe('pictures for slides', () => {
  test('the community page links each picture as SVG and PNG', async () => {
    const text = await html(community('harbour-point'));
    for (const name of ['map', 'hazard-curve', 'shaking-cards'])
      for (const format of ['svg', 'png'])
        expect(text).toContain(`href="${community('harbour-point')}/images/${name}.${format}"`);
  });

  test('the SVG files parse and hold what they show', async () => {
    const expected: Record<
      string,
      { size: [number, number]; holds: (doc: Element, text: string) => void }
    > = {
      map: {
        size: [960, 720],
        holds: (doc, text) => {
          expect(doc.getElementsByTagName('path').length).toBeGreaterThan(3);
          expect(text).toContain('data-source="orle-interface"');
          expect(text).toContain('class="north-arrow"');
          expect(text).toContain('>Harbour Point</text>');
        },
      },
      'hazard-curve': {
        size: [960, 600],
        holds: (_doc, text) => {
          expect(text).toMatch(/<path class="mean-curve" d="M[\d.]+,[\d.]+L/);
          expect(text).toContain(en.t('plot.pga'));
        },
      },
      'shaking-cards': {
        size: [1280, 720],
        holds: (doc, text) => {
          const cards = [...text.matchAll(/<g class="shaking-card" data-return-period="(\d+)"/g)];
          expect(cards.map((m) => m[1])).toEqual(['475', '2475']);
          expect(doc.getElementsByTagName('title')[0]?.textContent).toBe(
            en.t('material.cardsTitle', { name: 'Harbour Point' }),
          );
        },
      },
    };
    for (const [name, { size, holds }] of Object.entries(expected)) {
      const response = await get(`${community('harbour-point')}/images/${name}.svg`);
      expect(response.status, name).toBe(200);
      expect(response.headers.get('content-type')).toBe('image/svg+xml; charset=utf-8');
      expect(response.headers.get('content-disposition')).toBe(
        `attachment; filename="harbour-point-${name}.svg"`,
      );
      const text = await response.text();
      const doc = parseSvg(text);
      expect([Number(doc.getAttribute('width')), Number(doc.getAttribute('height'))], name).toEqual(
        size,
      );
      holds(doc, text);
    }
  });

  test('the PNG files are PNGs at twice the SVG size', async () => {
    for (const [name, size] of [
      ['map', [1920, 1440]],
      ['hazard-curve', [1920, 1200]],
      ['shaking-cards', [2560, 1440]],
    ] as const) {
      const response = await get(`${community('vennick-bay')}/images/${name}.png`);
      expect(response.status, name).toBe(200);
      expect(response.headers.get('content-type')).toBe('image/png');
      expect(response.headers.get('content-disposition')).toBe(
        `attachment; filename="vennick-bay-${name}.png"`,
      );
      const bytes = Buffer.from(await response.arrayBuffer());
      expect(bytes.subarray(0, 8).equals(PNG_SIGNATURE), name).toBe(true);
      expect(pngSize(bytes), name).toEqual({ width: size[0], height: size[1] });
    }
  });

  test('an unknown picture or format answers 404', async () => {
    await html(`${community('harbour-point')}/images/map.gif`, 404);
    await html(`${community('harbour-point')}/images/portrait.svg`, 404);
  });
});
