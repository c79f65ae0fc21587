import { readFileSync } from 'node:fs';
import type { Hono } from 'hono';
import { paletteCss } from '../style/palette.ts';

const STATIC_DIR = new URL('../static/', import.meta.url);
const read = (name: string): string => readFileSync(new URL(name, STATIC_DIR), 'utf8');

/**
 * The style sheets and the one script, read once at start: the palette's custom properties
 * (style/palette.ts) head the main sheet, so colours have one source.
 */
export function staticFiles(app: Hono): void {
  const css = `${paletteCss()}\n${read('tremora.css')}`;
  const script = read('tremora.js');
  const handoutCss = read('handout.css');
  const posterCss = read('poster.css');
  const cache = { 'Cache-Control': 'no-cache' };

  app.get('/static/tremora.css', (c) =>
    c.body(css, 200, { 'Content-Type': 'text/css; charset=utf-8', ...cache }),
  );
  app.get('/static/tremora.js', (c) =>
    c.body(script, 200, { 'Content-Type': 'text/javascript; charset=utf-8', ...cache }),
  );
  app.get('/static/handout.css', (c) =>
    c.body(handoutCss, 200, { 'Content-Type': 'text/css; charset=utf-8', ...cache }),
  );
  app.get('/static/poster.css', (c) =>
    c.body(posterCss, 200, { 'Content-Type': 'text/css; charset=utf-8', ...cache }),
  );
}
