import type { InputIssue } from '../../api/engine/errors.ts';
import { TECTONIC_SETTINGS, type TectonicSetting } from '../../api/engine/model.ts';
import type { ModelCatalog } from '../../api/engine/motion/catalog.ts';

/** The settings the form edits as text; `levels` stay as the study document holds them. */
export const SETTING_FIELDS = [
  'measures',
  'returnPeriodsYears',
  'horizonsYears',
  'truncationSigma',
  'maxDistanceKm',
  'magnitudeStep',
  'ruptureSpacingKm',
  'zoneCellKm',
  'intensityMeasure',
  'fractiles',
] as const;
export type SettingField = (typeof SETTING_FIELDS)[number];

/** Settings given as a list: values separated by commas, semicolons or spaces. */
export const LIST_FIELDS: ReadonlySet<SettingField> = new Set([
  'measures',
  'returnPeriodsYears',
  'horizonsYears',
  'fractiles',
]);
const TEXT_FIELDS: ReadonlySet<SettingField> = new Set(['measures', 'intensityMeasure']);

/** One branch row as posted: model name and weight as typed. */
export interface BranchRow {
  readonly model: string;
  readonly weight: string;
}

/** The ground-motion page's form, as text: branch rows per setting and the settings. */
export interface MotionForm {
  readonly branches: Readonly<Record<string, readonly BranchRow[]>>;
  readonly settings: Readonly<Record<SettingField, string>>;
}

const listText = (value: unknown): string =>
  Array.isArray(value) ? value.map(String).join(', ') : value === undefined ? '' : String(value);

/** The form of a stored study document: its branches (the catalog's default where it gives none) and settings. */
export function motionFormOf(raw: Record<string, unknown>, models: ModelCatalog): MotionForm {
  const given = (raw.groundMotion ?? {}) as Record<string, unknown>;
  const branches: Record<string, BranchRow[]> = {};
  for (const setting of TECTONIC_SETTINGS) {
    const list = Array.isArray(given[setting])
      ? (given[setting] as { model?: unknown; weight?: unknown }[])
      : models.defaultBranches[setting];
    branches[setting] = list.map((b) => ({ model: String(b.model), weight: String(b.weight) }));
  }
  const settings = (raw.settings ?? {}) as Record<string, unknown>;
  return {
    branches,
    settings: Object.fromEntries(
      SETTING_FIELDS.map((key) => [key, listText(settings[key])]),
    ) as Record<SettingField, string>,
  };
}

type Posted = Record<string, string | File | (string | File)[]>;

/**
 * The form as posted: rows `branch.<setting>.<i>.model|weight|remove` (a removed row is left
 * out), one new row per setting `add.<setting>.model|weight` (used when a model is chosen), and
 * `settings.<key>`. Rows keep their order on the page, the new one last, so the candidate
 * document's branch i is the form's row i when the page is shown again.
 */
export function postedMotionForm(form: Posted): MotionForm {
  const text = (name: string) => {
    const value = form[name];
    return typeof value === 'string' ? value : undefined;
  };
  const found = new Map<string, Map<number, BranchRow & { remove: boolean }>>();
  const added = new Map<string, BranchRow>();
  for (const name of Object.keys(form)) {
    const row = /^branch\.([^.]+)\.(\d+)\.model$/.exec(name);
    if (row) {
      const [, setting, index] = row as unknown as [string, string, string];
      const rows = found.get(setting) ?? new Map();
      found.set(setting, rows);
      const at = `branch.${setting}.${index}`;
      rows.set(Number(index), {
        model: text(name) ?? '',
        weight: text(`${at}.weight`) ?? '',
        remove: text(`${at}.remove`) === 'true',
      });
    }
    const add = /^add\.([^.]+)\.model$/.exec(name);
    const model = text(name)?.trim();
    if (add && model)
      added.set(add[1] as string, { model, weight: text(`${name.slice(0, -5)}weight`) ?? '' });
  }
  const branches: Record<string, BranchRow[]> = {};
  for (const setting of new Set([...found.keys(), ...added.keys()])) {
    const kept = [...(found.get(setting) ?? new Map()).entries()]
      .sort(([a], [b]) => a - b)
      .filter(([, r]) => !r.remove);
    branches[setting] = kept.map(([, r]) => ({ model: r.model, weight: r.weight }));
    const extra = added.get(setting);
    if (extra) branches[setting].push(extra);
  }
  const settings = Object.fromEntries(
    SETTING_FIELDS.map((key) => [key, text(`settings.${key}`) ?? '']),
  ) as Record<SettingField, string>;
  return { branches, settings };
}

/** A number as typed (a comma decimal accepted); text that is not a number is kept so the schema names it. */
function numberOrText(text: string): number | string {
  const value = Number(text.trim().replace(',', '.'));
  return text.trim() !== '' && Number.isFinite(value) ? value : text.trim();
}

/**
 * The form as the study document's `groundMotion` and `settings`: blank settings left out (the
 * defaults then hold), list settings split on commas, semicolons or spaces. A tectonic setting
 * that does not exist is refused here, as the document would only warn of an unknown key.
 * `levels` and any branch list the form leaves untouched are kept from `raw`.
 */
export function motionFromForm(
  raw: Record<string, unknown>,
  form: MotionForm,
  models: ModelCatalog,
):
  | { ok: true; groundMotion: Record<string, unknown>; settings: Record<string, unknown> }
  | {
      ok: false;
      issues: InputIssue[];
    } {
  const unknown = Object.keys(form.branches).filter(
    (s) => !TECTONIC_SETTINGS.includes(s as TectonicSetting),
  );
  if (unknown.length > 0)
    return {
      ok: false,
      issues: unknown.map((s) => ({
        path: `groundMotion.${s}`,
        message: `unknown tectonic setting "${s}"; expected one of ${TECTONIC_SETTINGS.join(', ')}`,
      })),
    };
  const groundMotion: Record<string, unknown> = { ...((raw.groundMotion ?? {}) as object) };
  for (const [setting, rows] of Object.entries(form.branches)) {
    const list = rows.map((r) => ({ model: r.model.trim(), weight: numberOrText(r.weight) }));
    const isDefault =
      JSON.stringify(list) === JSON.stringify(models.defaultBranches[setting as TectonicSetting]);
    // A setting the study left to the defaults stays so while the form keeps them unchanged.
    if (groundMotion[setting] === undefined && isDefault) continue;
    groundMotion[setting] = list;
  }
  const before = (raw.settings ?? {}) as Record<string, unknown>;
  const settings: Record<string, unknown> =
    before.levels === undefined ? {} : { levels: before.levels };
  for (const key of SETTING_FIELDS) {
    const text = form.settings[key].trim();
    if (text === '') continue;
    if (!LIST_FIELDS.has(key)) settings[key] = TEXT_FIELDS.has(key) ? text : numberOrText(text);
    else {
      const items = text.split(/[\s;,]+/).filter((item) => item !== '');
      settings[key] = TEXT_FIELDS.has(key) ? items : items.map(numberOrText);
    }
  }
  return { ok: true, groundMotion, settings };
}

/**
 * The form field an issue concerns: "crustal.0.weight", "crustal" (the setting's weights
 * together), "settings.returnPeriodsYears"; undefined for other issues.
 */
export function motionIssueField(path: string): string | undefined {
  const branch = /^groundMotion\.([^.[]+)(?:\[(\d+)\](?:\.(model|weight))?)?/.exec(path);
  if (branch && TECTONIC_SETTINGS.includes(branch[1] as TectonicSetting)) {
    const [, setting, index, part] = branch as unknown as [string, string, string?, string?];
    return index === undefined ? setting : `${setting}.${index}.${part ?? 'model'}`;
  }
  const setting = /^settings\.([^.[]+)/.exec(path);
  return setting && (SETTING_FIELDS as readonly string[]).includes(setting[1] as string)
    ? `settings.${setting[1]}`
    : undefined;
}
