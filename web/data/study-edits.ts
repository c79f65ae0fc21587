import { InvalidInput, type InputIssue } from '../../api/engine/errors.ts';
import type { Community } from '../../api/engine/model.ts';
import type { ModelCatalog } from '../../api/engine/motion/catalog.ts';
import type { StoredInputs } from '../../api/operations/study-input.ts';
import { validateDraft, type StudyFiles } from '../../api/operations/study-input.ts';
import { IMPORTED_COMMUNITIES_FILE } from '../../api/operations/study-records.ts';
import { withFaults } from '../../api/study/fault-files/add-faults.ts';
import { parseJsonText } from '../../api/study/json-text.ts';
import { motionFromForm, type MotionForm } from './motion-form.ts';
import { sourceFromForm, type SourceForm } from './source-form.ts';

/**
 * Edits the editor makes to a study document. Each builds the whole candidate document and
 * validates it as the API would; nothing is written unless it validates (the caller writes
 * `document` only on `ok`). The imports follow api/service/routes/imports.ts.
 */
export type EditOutcome =
  | {
      readonly ok: true;
      readonly document: Record<string, unknown>;
      readonly name: string;
      readonly file?: {
        readonly kind: 'communities-csv' | 'sources-geojson';
        readonly content: string;
      };
    }
  | { readonly ok: false; readonly issues: readonly InputIssue[] };

/** What the community form posts, as text. */
export type CommunityForm = Readonly<
  Record<'id' | 'name' | 'lon' | 'lat' | 'vs30' | 'siteClass' | 'population' | 'elevationM', string>
> & { readonly coastal: boolean };

const NUMBER_FIELDS = ['lon', 'lat', 'vs30', 'population', 'elevationM'] as const;

/**
 * A community form as the study document's JSON: blanks left out, numbers as numbers (a comma
 * decimal accepted), text that is not a number kept as text so the schema names the problem.
 */
export function communityFromForm(form: CommunityForm): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  if (form.id.trim() !== '') out.id = form.id.trim();
  if (form.name.trim() !== '') out.name = form.name.trim();
  for (const key of NUMBER_FIELDS) {
    const text = form[key].trim();
    if (text === '') continue;
    const value = Number(text.replace(',', '.'));
    out[key] = Number.isFinite(value) ? value : text;
  }
  if (form.siteClass.trim() !== '') out.siteClass = form.siteClass.trim();
  out.coastal = form.coastal;
  return out;
}

/** A validated community back as document JSON (vs30 only where it was given, else its site class). */
export function communityToJson(c: Community): Record<string, unknown> {
  return {
    id: c.id,
    name: c.name,
    lon: c.lon,
    lat: c.lat,
    ...(c.vs30Basis === 'measured' ? { vs30: c.vs30 } : {}),
    ...(c.siteClass !== undefined ? { siteClass: c.siteClass } : {}),
    ...(c.population !== undefined ? { population: c.population } : {}),
    coastal: c.coastal,
    ...(c.elevationM !== undefined ? { elevationM: c.elevationM } : {}),
  };
}

/** The study's communities as a JSON list (a study whose communities came as CSV gets them listed). */
export function communityList(
  inputs: StoredInputs,
  communities: readonly Community[],
): Record<string, unknown>[] {
  const raw = inputs.raw.communities;
  if (Array.isArray(raw)) return raw.map((c) => ({ ...(c as Record<string, unknown>) }));
  return communities.map(communityToJson);
}

function validated(
  document: Record<string, unknown>,
  models: ModelCatalog,
  files: StudyFiles = {},
): EditOutcome {
  try {
    const { study } = validateDraft(document, models, files);
    return { ok: true, document, name: study.name };
  } catch (error) {
    if (error instanceof InvalidInput) return { ok: false, issues: error.issues };
    throw error;
  }
}

/** Replaces the community at `index` (or appends one when index is undefined) and validates. */
export function saveCommunity(
  inputs: StoredInputs,
  communities: readonly Community[],
  form: CommunityForm,
  index: number | undefined,
  models: ModelCatalog,
): EditOutcome & { index: number } {
  const list = communityList(inputs, communities);
  const at = index ?? list.length;
  list[at] = communityFromForm(form);
  return { ...validated({ ...inputs.raw, communities: list }, models), index: at };
}

/** Removes the community at `index` and validates (without any left, the study is a draft again). */
export function removeCommunity(
  inputs: StoredInputs,
  communities: readonly Community[],
  index: number,
  models: ModelCatalog,
): EditOutcome {
  const list = communityList(inputs, communities);
  list.splice(index, 1);
  return validated({ ...inputs.raw, communities: list }, models);
}

/** Replaces the communities from CSV text; issues name CSV lines (`communities[line 5].lat`). */
export function importCommunitiesCsv(
  inputs: StoredInputs,
  csv: string,
  models: ModelCatalog,
): EditOutcome {
  const outcome = validated({ ...inputs.raw, communities: IMPORTED_COMMUNITIES_FILE }, models, {
    ...inputs,
    communitiesCsv: csv,
  });
  return outcome.ok ? { ...outcome, file: { kind: 'communities-csv', content: csv } } : outcome;
}

/** Replaces the sources from GeoJSON text; malformed JSON is one issue naming line and column. */
export function importSourcesGeoJson(
  inputs: StoredInputs,
  text: string,
  models: ModelCatalog,
): EditOutcome {
  const parsed = parseJsonText(text, 'sources');
  if (!parsed.ok) return { ok: false, issues: [parsed.issue] };
  const outcome = validated({ ...inputs.raw, sources: parsed.value }, models, inputs);
  return outcome.ok ? { ...outcome, file: { kind: 'sources-geojson', content: text } } : outcome;
}

/** The CSV line an issue names (`communities[line 5].lat` -> 5), if any. */
export function issueLine(path: string): number | undefined {
  const match = /\[line (\d+)\]/.exec(path);
  return match ? Number(match[1]) : undefined;
}

/** The feature an issue names (`sources.features[3].properties.dip` -> 3), if any. */
export function issueFeature(path: string): number | undefined {
  const match = /^sources\.features\[(\d+)\]/.exec(path);
  return match ? Number(match[1]) : undefined;
}

/** The field of a community issue at `index` (`communities[2].lat` -> "lat"; the row itself -> "(row)"). */
export function issueField(path: string, index: number): string | undefined {
  const prefix = `communities[${index}]`;
  if (!path.startsWith(prefix)) return undefined;
  const rest = path.slice(prefix.length);
  return rest.startsWith('.') ? (rest.slice(1).split(/[.[]/)[0] as string) : '(row)';
}

/** The study's source features as a list to edit (none yet in a draft). */
export function sourceFeatures(inputs: StoredInputs): Record<string, unknown>[] {
  const features = (inputs.raw.sources as { features?: unknown } | undefined)?.features;
  return Array.isArray(features) ? features.map((f) => ({ ...(f as object) })) : [];
}

/**
 * Replaces the source at `index` (or appends one when index is undefined) with the form's and
 * validates the whole study; the other sources are kept as they were.
 */
export function saveSource(
  inputs: StoredInputs,
  form: SourceForm,
  index: number | undefined,
  models: ModelCatalog,
): EditOutcome & { index: number } {
  const list = sourceFeatures(inputs);
  const at = index ?? list.length;
  const read = sourceFromForm(form);
  if (!read.ok) return { ok: false, issues: [read.issue], index: at };
  list[at] = read.feature;
  const document = { ...inputs.raw, sources: { type: 'FeatureCollection', features: list } };
  return { ...validated(document, models, inputs), index: at };
}

/** Removes the source at `index` and validates (without any left, the study is a draft again). */
export function removeSource(
  inputs: StoredInputs,
  index: number,
  models: ModelCatalog,
): EditOutcome {
  const list = sourceFeatures(inputs);
  list.splice(index, 1);
  const document = { ...inputs.raw, sources: { type: 'FeatureCollection', features: list } };
  return validated(document, models, inputs);
}

/** Adds source features after the study's own (which are kept) and validates the whole study. */
export function addSources(
  inputs: StoredInputs,
  features: readonly Record<string, unknown>[],
  models: ModelCatalog,
): EditOutcome {
  return validated(withFaults(inputs.raw, features), models, inputs);
}

/** Replaces the ground-motion branches and settings with the page's and validates the whole study. */
export function saveMotion(
  inputs: StoredInputs,
  form: MotionForm,
  models: ModelCatalog,
): EditOutcome {
  const read = motionFromForm(inputs.raw, form, models);
  if (!read.ok) return read;
  const document = { ...inputs.raw, groundMotion: read.groundMotion, settings: read.settings };
  return validated(document, models, inputs);
}
