import type { Context, Hono } from 'hono';
import { InvalidInput, type InputIssue } from '../../api/engine/errors.ts';
import type { ZoneRecurrence } from '../../api/engine/catalog/zone-recurrence.ts';
import type { LonLat, Study } from '../../api/engine/model.ts';
import { detectCatalogFormat } from '../../api/catalog/index.ts';
import { validateStudy } from '../../api/operations/study-input.ts';
import {
  MAGNITUDE_RELATIONS,
  type MagnitudeRelation,
} from '../../api/engine/catalog/magnitude-conversion.ts';
import { analyseCatalog, fitZone } from '../data/catalog-analysis.ts';
import {
  attachCatalog,
  readDemoCatalog,
  studyCatalog,
  type AttachedCatalog,
} from '../data/study-catalog.ts';
import { readStudy, type StudyData } from '../data/study-data.ts';
import { CatalogView, OUTLINE_CHOICE, type ZoneForm } from '../views/catalog-view.tsx';
import { field, fileField, type PageKit } from './page-kit.ts';
import { studyNotFoundPage } from './message-pages.tsx';

/** A zone form filled in for a first look: the study's first crustal zone (else its first zone), M 7, 10 km deep. */
function defaultZone(study: Study): ZoneForm {
  const zone =
    study.sources.find((s) => s.kind === 'zone' && s.setting === 'crustal') ??
    study.sources.find((s) => s.kind === 'zone');
  return {
    polygon: zone?.id ?? OUTLINE_CHOICE,
    mMax: '7.0',
    depthKm: '10',
    id: 'catalog-zone',
    name: 'Zone fitted from the catalog',
  };
}

function ringsOf(study: Study, choice: string): readonly (readonly LonLat[])[] | undefined {
  if (choice === OUTLINE_CHOICE) return study.outline?.[0] ? [study.outline[0]] : undefined;
  const zone = study.sources.find((s) => s.id === choice);
  return zone?.kind === 'zone' ? zone.rings : undefined;
}

/** The zone form checked field by field (paths are the form's field names). */
function readZoneForm(
  form: ZoneForm,
  study: Study,
): { issues: InputIssue[]; rings?: readonly (readonly LonLat[])[]; mMax: number; depthKm: number } {
  const issues: InputIssue[] = [];
  const rings = ringsOf(study, form.polygon);
  if (!rings)
    issues.push({
      path: 'polygon',
      message: `expected one of the study's zones or its outline, got "${form.polygon}"`,
    });
  const mMax = Number(form.mMax.replace(',', '.'));
  if (!(Number.isFinite(mMax) && mMax >= 4 && mMax <= 9.6))
    issues.push({
      path: 'mMax',
      message: `expected a moment magnitude from 4 to 9.6, got "${form.mMax}"`,
    });
  const depthKm = Number(form.depthKm.replace(',', '.'));
  if (!(Number.isFinite(depthKm) && depthKm >= 0 && depthKm <= 700))
    issues.push({
      path: 'depthKm',
      message: `expected a depth from 0 to 700 km, got "${form.depthKm}"`,
    });
  return { issues, ...(rings ? { rings } : {}), mMax, depthKm };
}

/**
 * The catalog view. A catalog is attached to the study (study_catalogs) once it loads at least
 * one event; a file that loads none is shown back with its problems and attaches nothing.
 */
export function catalogPages(app: Hono, kit: PageKit): void {
  const { ctx } = kit;

  const load = (
    c: Context,
  ): { data: StudyData & { ok: true } } | { response: Response | Promise<Response> } => {
    const data = readStudy(ctx, c.req.param('id') as string);
    if (!data || !data.ok) return { response: studyNotFoundPage(kit, c) };
    return { data };
  };

  const page = (
    c: Context,
    data: StudyData & { ok: true },
    catalog: AttachedCatalog | undefined,
    extra: {
      zone?: ZoneForm;
      zoneFit?: ZoneRecurrence;
      zoneIssues?: InputIssue[];
      uploadIssues?: InputIssue[];
    } = {},
  ) => {
    const conversions = chosenConversions(c.req.queries('convert'));
    const analysis = catalog
      ? analyseCatalog(catalog.text, catalog.format, conversions)
      : undefined;
    const failed = (extra.zoneIssues?.length ?? 0) > 0 || (extra.uploadIssues?.length ?? 0) > 0;
    return kit.render(
      c,
      <CatalogView
        page={kit.page(c)}
        studyId={data.record.id}
        study={data.study}
        {...(catalog ? { catalog } : {})}
        {...(analysis?.ok ? { analysis } : {})}
        zone={extra.zone ?? defaultZone(data.study)}
        {...(extra.zoneFit ? { zoneFit: extra.zoneFit } : {})}
        zoneIssues={extra.zoneIssues ?? []}
        uploadIssues={extra.uploadIssues ?? []}
        zoneAdded={c.req.query('zone') === 'added'}
        conversions={conversions}
      />,
      failed ? 422 : 200,
    );
  };

  app.get('/studies/:id/catalog', (c) => {
    const loaded = load(c);
    return 'response' in loaded
      ? loaded.response
      : page(c, loaded.data, studyCatalog(ctx, loaded.data.record.id));
  });

  app.post('/studies/:id/catalog', async (c) => {
    const loaded = load(c);
    if ('response' in loaded) return loaded.response;
    const tr = kit.tr(c);
    const form = await c.req.parseBody();
    const file = fileField(form, 'file');
    const id = loaded.data.record.id;
    let catalog: AttachedCatalog;
    if (field(form, 'demo') === '1') catalog = readDemoCatalog();
    else if (file) {
      const text = await file.text();
      catalog = { text, format: detectCatalogFormat(text), fileName: file.name || 'catalog' };
    } else {
      return page(c, loaded.data, studyCatalog(ctx, id), {
        uploadIssues: [{ path: 'file', message: tr.t('editor.upload.noFile') }],
      });
    }
    const analysis = analyseCatalog(catalog.text, catalog.format);
    if (!analysis.ok)
      return page(c, loaded.data, studyCatalog(ctx, id), { uploadIssues: [...analysis.issues] });
    attachCatalog(ctx, id, catalog, analysis.load);
    return c.redirect(`/studies/${id}/catalog`, 303);
  });

  app.post('/studies/:id/catalog/zone', async (c) => {
    const loaded = load(c);
    if ('response' in loaded) return loaded.response;
    const { data } = loaded;
    const form = await c.req.parseBody();
    const catalog = studyCatalog(ctx, data.record.id);
    const zone: ZoneForm = {
      polygon: field(form, 'polygon') ?? '',
      mMax: field(form, 'mMax') ?? '',
      depthKm: field(form, 'depthKm') ?? '',
      id: (field(form, 'id') ?? '').trim(),
      name: (field(form, 'name') ?? '').trim(),
    };
    if (!catalog)
      return page(c, data, undefined, {
        zone,
        zoneIssues: [{ path: 'catalog', message: 'expected a catalog; load one first' }],
      });
    const checked = readZoneForm(zone, data.study);
    if (checked.issues.length > 0 || !checked.rings)
      return page(c, data, catalog, { zone, zoneIssues: checked.issues });
    let zoneFit: ZoneRecurrence;
    try {
      const analysis = analyseCatalog(catalog.text, catalog.format);
      if (!analysis.ok) return page(c, data, catalog, { zone, zoneIssues: [...analysis.issues] });
      zoneFit = fitZone(analysis.load, { rings: checked.rings, mMax: checked.mMax });
    } catch (error) {
      if (error instanceof InvalidInput)
        return page(c, data, catalog, { zone, zoneIssues: [...error.issues] });
      throw error;
    }
    if (field(form, 'action') !== 'add') return page(c, data, catalog, { zone, zoneFit });
    const feature = {
      type: 'Feature',
      geometry: { type: 'Polygon', coordinates: checked.rings.map((r) => r.map((p) => [...p])) },
      properties: {
        id: zone.id,
        name: zone.name,
        setting: 'crustal',
        mechanism: 'strike-slip',
        depthKm: checked.depthKm,
        recurrence: zoneFit.recurrence,
      },
    };
    const sources = data.inputs.raw.sources as { type?: unknown; features?: unknown[] } | undefined;
    const features = [...(Array.isArray(sources?.features) ? sources.features : []), feature];
    const document = {
      ...data.inputs.raw,
      sources: { ...(sources ?? {}), type: 'FeatureCollection', features },
    };
    try {
      const { study } = validateStudy(document, ctx.models, data.inputs);
      ctx.store.studies.replace(data.record.id, {
        name: study.name,
        document: JSON.stringify(document, null, 2),
      });
    } catch (error) {
      if (!(error instanceof InvalidInput)) throw error;
      // The new feature's problems are named by the form's fields; the rest as they come.
      const last = `sources.features[${features.length - 1}].properties.`;
      const issues = error.issues.map((i) =>
        i.path.startsWith(last) ? { path: i.path.slice(last.length), message: i.message } : i,
      );
      return page(c, data, catalog, { zone, zoneFit, zoneIssues: issues });
    }
    return c.redirect(`/studies/${data.record.id}/catalog?zone=added`, 303);
  });
}

/**
 * The relations chosen on the page (`?convert=ID`, repeatable): known ids only, one per scale
 * (the first chosen); anything else is ignored, as a page query is not a request to refuse.
 */
function chosenConversions(given: readonly string[] | undefined): string[] {
  const chosen: MagnitudeRelation[] = [];
  for (const id of given ?? []) {
    const relation = MAGNITUDE_RELATIONS.find((r) => r.id === id);
    if (relation && !chosen.some((r) => r.scale === relation.scale)) chosen.push(relation);
  }
  return chosen.map((r) => r.id);
}
