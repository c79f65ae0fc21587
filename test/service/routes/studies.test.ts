import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { expectError, expectSecurityHeaders } from '../helpers/assertions.ts';
import { jsonInit, serviceForFile } from '../helpers/service-process.ts';
import { smallStudy } from '../helpers/small-study.ts';

const service = serviceForFile('studies');

const packageVersion = (
  JSON.parse(readFileSync(new URL('../../../package.json', import.meta.url), 'utf8')) as {
    version: string;
  }
).version;

interface StudyAnswer {
  id: string;
  name: string;
  createdAt: string;
  updatedAt: string;
  warnings: { path: string; message: string }[];
  document?: Record<string, unknown>;
  communitiesCsv?: string | null;
}

async function createSmall(name?: string): Promise<StudyAnswer> {
  const response = await service.fetch('/api/studies', jsonInit('POST', smallStudy(name)));
  expect(response.status).toBe(201);
  return (await response.json()) as StudyAnswer;
}

describe('GET /api/health', () => {
  it('answers ok with the version and the workers', async () => {
    const response = await service.fetch('/api/health');
    expect(response.status).toBe(200);
    expectSecurityHeaders(response);
    const body = (await response.json()) as {
      status: string;
      version: string;
      database: string;
      workers: { runs: { alive: number } };
    };
    expect(body).toMatchObject({
      status: 'ok',
      tool: 'tremora',
      version: packageVersion,
      database: 'ok',
    });
    expect(body.workers.runs.alive).toBeGreaterThanOrEqual(1);
  });
});

describe('studies', () => {
  it('has the demo study on first start', async () => {
    const body = (await (await service.fetch('/api/studies')).json()) as { studies: StudyAnswer[] };
    expect(body.studies.map((s) => s.name)).toContain('Demo coast');
  });

  it('creates a study (201, Location) and keeps the document text exactly as sent', async () => {
    const text = `${JSON.stringify(smallStudy('Kept as sent'), null, 3)}\n\n`;
    const response = await service.fetch('/api/studies', jsonInit('POST', text));
    expect(response.status).toBe(201);
    expectSecurityHeaders(response);
    const created = (await response.json()) as StudyAnswer;
    expect(response.headers.get('location')).toBe(`/api/studies/${created.id}`);
    expect(created).toMatchObject({ name: 'Kept as sent', warnings: [] });
    const document = await service.fetch(`/api/studies/${created.id}/document`);
    expect(await document.text()).toBe(text);
    const read = (await (await service.fetch(`/api/studies/${created.id}`)).json()) as StudyAnswer;
    expect(read.document).toEqual(smallStudy('Kept as sent'));
    expect(read.communitiesCsv).toBeNull();
    const list = (await (await service.fetch('/api/studies')).json()) as { studies: StudyAnswer[] };
    expect(list.studies.map((s) => s.id)).toContain(created.id);
  });

  it('returns warnings for unknown keys without refusing the study', async () => {
    const study = { ...smallStudy(), colour: 'teal' };
    const response = await service.fetch('/api/studies', jsonInit('POST', study));
    expect(response.status).toBe(201);
    const body = (await response.json()) as StudyAnswer;
    expect(body.warnings.map((w) => w.path)).toEqual(['colour']);
  });

  it('replaces a study; an invalid replacement changes nothing', async () => {
    const created = await createSmall('Before');
    const replaced = await service.fetch(
      `/api/studies/${created.id}`,
      jsonInit('PUT', smallStudy('After')),
    );
    expect(replaced.status).toBe(200);
    expect(((await replaced.json()) as StudyAnswer).name).toBe('After');
    const bad = smallStudy('Never saved');
    (bad.communities as Record<string, unknown>[])[0]!.lat = 123;
    const refused = await expectError(
      await service.fetch(`/api/studies/${created.id}`, jsonInit('PUT', bad)),
      422,
    );
    expect(refused.issues.map((i) => i.path)).toEqual(['communities[0].lat']);
    const read = (await (await service.fetch(`/api/studies/${created.id}`)).json()) as StudyAnswer;
    expect(read.name).toBe('After');
  });

  it('deletes a study (204), then answers 404 for it', async () => {
    const created = await createSmall();
    const deleted = await service.fetch(`/api/studies/${created.id}`, { method: 'DELETE' });
    expect(deleted.status).toBe(204);
    expectSecurityHeaders(deleted);
    const gone = await expectError(await service.fetch(`/api/studies/${created.id}`), 404);
    expect(gone.error).toBe(`no study with id "${created.id}"`);
    await expectError(await service.fetch(`/api/studies/${created.id}`, { method: 'DELETE' }), 404);
    await expectError(
      await service.fetch(`/api/studies/${created.id}`, jsonInit('PUT', smallStudy())),
      404,
    );
  });
});

describe('errors on the study routes', () => {
  it('422 lists every problem with its path', async () => {
    const bad = smallStudy();
    const community = (bad.communities as Record<string, unknown>[])[0]!;
    community.lat = 95;
    community.vs30 = -5;
    const feature = (bad.sources as { features: { properties: Record<string, unknown> }[] })
      .features[0]!;
    feature.properties.setting = 'volcanic';
    delete feature.properties.depthKm;
    const body = await expectError(await service.fetch('/api/studies', jsonInit('POST', bad)), 422);
    expect(body.error).toBe('the input has 4 problems');
    expect(body.issues.map((i) => i.path).sort()).toEqual(
      [
        'communities[0].lat',
        'communities[0].vs30',
        'sources.features[0].properties.depthKm',
        'sources.features[0].properties.setting',
      ].sort(),
    );
    const setting = body.issues.find((i) => i.path.endsWith('setting'));
    expect(setting?.message).toBe(
      'expected one of "crustal", "interface", "intraslab", got "volcanic"',
    );
  });

  it('400 for malformed JSON, naming where', async () => {
    const body = await expectError(
      await service.fetch('/api/studies', jsonInit('POST', '{\n  "name": "x",\n  oops\n}')),
      400,
    );
    expect(body.error).toBe('malformed JSON');
    expect(body.issues).toHaveLength(1);
    expect(body.issues[0]?.path).toBe('(body)');
    expect(body.issues[0]?.message).toMatch(
      /^expected valid JSON; the text is malformed at line 3, column 3/,
    );
  });

  it('422 for JSON that is not an object', async () => {
    const body = await expectError(
      await service.fetch('/api/studies', jsonInit('POST', '[1, 2]')),
      422,
    );
    expect(body.issues).toEqual([
      { path: '(body)', message: 'expected a study document as a JSON object, got a list' },
    ]);
  });

  it('415 for another content type', async () => {
    const response = await service.fetch('/api/studies', {
      method: 'POST',
      headers: { 'Content-Type': 'text/plain' },
      body: JSON.stringify(smallStudy()),
    });
    const body = await expectError(response, 415);
    expect(body.error).toBe(
      'expected a study document with Content-Type application/json, got text/plain',
    );
    expect(response.headers.get('accept')).toBe('application/json');
    await expectError(
      await service.fetch('/api/studies', { method: 'POST', body: new Uint8Array([123, 125]) }),
      415,
    );
  });

  it('413 for a body over the limit', async () => {
    const huge = JSON.stringify({ ...smallStudy(), padding: 'x'.repeat(6 * 1024 * 1024) });
    const body = await expectError(
      await service.fetch('/api/studies', jsonInit('POST', huge)),
      413,
    );
    expect(body.error).toBe('the request body is over the limit of 5242880 bytes');
  });

  it('405 with Allow for a known path and a wrong method', async () => {
    const response = await service.fetch('/api/studies', { method: 'PATCH' });
    const body = await expectError(response, 405);
    expect(response.headers.get('allow')).toBe('GET, HEAD, POST');
    expect(body.error).toBe('PATCH is not allowed on /api/studies; expected GET, HEAD, POST');
  });

  it('404 JSON for an unknown API route, and a 404 page for people elsewhere', async () => {
    const body = await expectError(await service.fetch('/api/no-such-thing'), 404);
    expect(body.error).toMatch(/^no route GET \/api\/no-such-thing/);
    const page = await service.fetch('/elsewhere');
    expect(page.status).toBe(404);
    expect(page.headers.get('content-type')).toMatch(/^text\/html/);
    expectSecurityHeaders(page);
  });

  it('403 for a write sent from another site', async () => {
    const init = jsonInit('POST', smallStudy(), { Origin: 'http://other-site.invalid' });
    const body = await expectError(await service.fetch('/api/studies', init), 403);
    expect(body.error).toMatch(/^writes are accepted only from this service's own pages/);
  });
});

describe('POST /api/studies/:id/duplicate and /rename', () => {
  it('a copy has the document under its own name; a rename writes the name into the document', async () => {
    const created = await createSmall('First');
    const copied = await service.fetch(
      `/api/studies/${created.id}/duplicate`,
      jsonInit('POST', { name: 'Second' }),
    );
    expect(copied.status).toBe(201);
    const copy = (await copied.json()) as StudyAnswer;
    expect(copied.headers.get('location')).toBe(`/api/studies/${copy.id}`);
    const read = (await (await service.fetch(`/api/studies/${copy.id}`)).json()) as StudyAnswer;
    expect(read.document).toEqual(smallStudy('Second'));

    const renamed = await service.fetch(
      `/api/studies/${created.id}/rename`,
      jsonInit('POST', { name: 'First, renamed' }),
    );
    expect(renamed.status).toBe(200);
    const again = (await (await service.fetch(`/api/studies/${created.id}`)).json()) as StudyAnswer;
    expect(again.name).toBe('First, renamed');
    expect(again.document).toEqual(smallStudy('First, renamed'));
  });

  it('a blank name is refused with its path; an unknown study is 404', async () => {
    const created = await createSmall('Kept');
    const body = await expectError(
      await service.fetch(`/api/studies/${created.id}/rename`, jsonInit('POST', { name: ' ' })),
      422,
    );
    expect(body.issues).toEqual([
      { path: 'name', message: 'expected a study name of 1 to 200 characters, got " "' },
    ]);
    await expectError(
      await service.fetch('/api/studies/no-such-study/duplicate', jsonInit('POST', { name: 'x' })),
      404,
    );
  });

  it('a body with more than the name (a whole study sent to the wrong address) changes nothing', async () => {
    const created = await createSmall('Unchanged');
    const body = await expectError(
      await service.fetch(
        `/api/studies/${created.id}/rename`,
        jsonInit('POST', smallStudy('Other')),
      ),
      422,
    );
    expect(body.issues).toContainEqual({
      path: 'communities',
      message: 'unexpected field; the body is { "name": ... }',
    });
    const after = (await (await service.fetch(`/api/studies/${created.id}`)).json()) as {
      name: string;
    };
    expect(after.name).toBe('Unchanged');
  });
});
