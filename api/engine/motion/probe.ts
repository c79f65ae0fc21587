import type { Mechanism, TectonicSetting } from '../model.ts';
import { measureSupport, type ModelCatalog } from './catalog.ts';
import { InvalidInput } from '../errors.ts';
import { measureUnit, parseMeasure } from './measure.ts';
import { PGV_FROM_SA_NOTE, withPgvFromSa } from './pgv-from-sa.ts';
import { RUPTURE_NUMBERS, type GmmInput } from './types.ts';

/** What the probe is asked: one model, one rupture–site geometry, some measures. */
export interface ProbeRequest {
  readonly model: string;
  readonly magnitude: number;
  readonly rjbKm: number;
  readonly rrupKm?: number;
  readonly rxKm?: number;
  readonly ry0Km?: number;
  readonly rhypoKm?: number;
  /** m/s; 760 (the NGA-West2 reference rock) when absent. */
  readonly vs30?: number;
  readonly mechanism?: Mechanism;
  readonly rakeDeg?: number;
  readonly dipDeg?: number;
  readonly ztorKm?: number;
  readonly widthKm?: number;
  readonly hypoDepthKm?: number;
  readonly setting?: TectonicSetting;
  readonly measures?: readonly string[];
}

export interface ProbeMeasure {
  /** Median in g (PGV cm/s). */
  readonly median: number;
  readonly unit: 'g' | 'cm/s';
  /** Natural-log standard deviations: total, between-event, within-event. */
  readonly sigma: number;
  readonly tau: number;
  readonly phi: number;
  readonly applicable: boolean;
  readonly notes: readonly string[];
  /** How the measure was derived when the model does not predict it (PGV from SA). */
  readonly derived?: string;
}

export interface ProbeResult {
  readonly model: string;
  readonly citation: string;
  /** Every input the model saw, defaults filled in. */
  readonly input: GmmInput;
  /** The assumptions that reach the model's equations (an input it reads, or one they are derived for). */
  readonly defaults: readonly string[];
  /** Assumptions filled in that this model, in this setting, does not read. */
  readonly unusedDefaults: readonly string[];
  /** The distance the model's equations use for this setting, when known (rjbKm, rrupKm or rhypoKm). */
  readonly distanceUsed?: 'rjbKm' | 'rrupKm' | 'rhypoKm';
  readonly measures: Readonly<Record<string, ProbeMeasure>>;
}

const RAKE_OF: Record<Mechanism, number> = { 'strike-slip': 0, reverse: 90, normal: -90 };
/** Dips assumed when none is given: vertical strike-slip, 45° dip-slip (common practice). */
const DIP_OF: Record<Mechanism, number> = { 'strike-slip': 90, reverse: 45, normal: 45 };
/** Mechanisms assumed per setting when none is given: the usual ones (common practice). */
const MECHANISM_OF: Record<TectonicSetting, Mechanism> = {
  crustal: 'strike-slip',
  interface: 'reverse',
  intraslab: 'normal',
};
const DEFAULT_MEASURES = ['PGA', 'PGV', 'SA(0.2)', 'SA(1.0)'];

/**
 * Evaluates one ground-motion model for a stated magnitude, distances, site and rupture.
 * Missing distances follow from Rjb by stated assumptions (listed in `defaults`): Rrup for a
 * rupture whose top edge is at ztorKm straight below the closest point, Rhypo from the
 * hypocentral depth, Rx = −Rjb (a footwall site, so no hanging-wall term) and Ry0 = 0.
 */
export function probeMotion(request: ProbeRequest, models: ModelCatalog): ProbeResult {
  const base = models.get(request.model);
  // Asked-for measures a model lacks raise an error; the default list keeps only what it has.
  const keys =
    request.measures ??
    DEFAULT_MEASURES.filter((k) => measureSupport(base, parseMeasure(k)) === undefined);
  const model = keys.includes('PGV') ? withPgvFromSa(base) : base;
  const defaults: string[] = [];
  const setting = request.setting ?? (model.settings[0] as TectonicSetting);
  if (!model.settings.includes(setting)) {
    throw new InvalidInput([
      {
        path: 'setting',
        message: `${model.name} is for ${model.settings.join(' and ')} earthquakes, got "${setting}"`,
      },
    ]);
  }
  const take = <T>(given: T | undefined, fallback: T, note: string): T => {
    if (given !== undefined) return given;
    defaults.push(note);
    return fallback;
  };
  const mechanism = take(
    request.mechanism,
    MECHANISM_OF[setting],
    `mechanism = ${MECHANISM_OF[setting]} for ${setting}`,
  );
  const ztorKm = take(request.ztorKm, 0, 'ztorKm = 0 (rupture reaches the surface)');
  const hypoDepthKm = take(
    request.hypoDepthKm,
    setting === 'intraslab' ? 60 : 10,
    `hypoDepthKm = ${setting === 'intraslab' ? 60 : 10}`,
  );
  const dipDeg = take(
    request.dipDeg,
    DIP_OF[mechanism],
    `dipDeg = ${DIP_OF[mechanism]} for ${mechanism}`,
  );
  const input: GmmInput = {
    magnitude: request.magnitude,
    rakeDeg: take(
      request.rakeDeg,
      RAKE_OF[mechanism],
      `rakeDeg = ${RAKE_OF[mechanism]} for ${mechanism}`,
    ),
    mechanism,
    setting,
    dipDeg,
    ztorKm,
    widthKm: take(request.widthKm, 15, 'widthKm = 15'),
    hypoDepthKm,
    rjbKm: request.rjbKm,
    rrupKm: take(request.rrupKm, Math.hypot(request.rjbKm, ztorKm), 'rrupKm = sqrt(rjb² + ztor²)'),
    rxKm: take(request.rxKm, -request.rjbKm, 'rxKm = -rjbKm (footwall)'),
    ry0Km: take(request.ry0Km, 0, 'ry0Km = 0'),
    rhypoKm: take(
      request.rhypoKm,
      Math.hypot(request.rjbKm, hypoDepthKm),
      'rhypoKm = sqrt(rjb² + hypoDepth²)',
    ),
    repiKm: request.rjbKm,
    vs30: take(request.vs30, 760, 'vs30 = 760 m/s'),
    vs30Measured: true,
  };
  const measures: Record<string, ProbeMeasure> = {};
  for (const key of keys) {
    const measure = parseMeasure(key);
    const p = model.predict(input, measure);
    const derived = measure.kind === 'PGV' && !base.hasPgv ? { derived: PGV_FROM_SA_NOTE } : {};
    measures[key] = {
      median: Math.exp(p.lnMedian),
      unit: measureUnit(measure),
      sigma: p.sigma,
      tau: p.tau,
      phi: p.phi,
      applicable: p.applicable,
      notes: p.notes,
      ...derived,
    };
  }
  const used = INPUTS_READ[model.name]?.(setting);
  const reaches = (note: string): boolean => {
    if (!used) return true;
    const key = note.split(' ')[0] as string;
    return used.includes(key) || (FEEDS[key] ?? []).some((derived) => used.includes(derived));
  };
  const distanceUsed = used?.find(
    (k): k is 'rjbKm' | 'rrupKm' | 'rhypoKm' => k === 'rjbKm' || k === 'rrupKm' || k === 'rhypoKm',
  );
  return {
    model: model.name,
    citation: model.citation,
    input,
    defaults: defaults.filter(reaches),
    unusedDefaults: defaults.filter((d) => !reaches(d)),
    ...(distanceUsed ? { distanceUsed } : {}),
    measures,
  };
}

/**
 * The inputs each model's equations read, by setting (read from the model files: cornell79.ts,
 * bssa14.ts, cb14.ts, aga16.ts). A model not listed has every assumption reported.
 */
const INPUTS_READ: Readonly<Record<string, (setting: TectonicSetting) => readonly string[]>> = {
  Cornell79: () => ['magnitude', 'rhypoKm'],
  BSSA14: () => ['magnitude', 'rakeDeg', 'rjbKm', 'vs30'],
  // Campbell & Bozorgnia (2014) read every number of the rupture context.
  CB14: () => [...RUPTURE_NUMBERS, 'rjbKm', 'rrupKm', 'rxKm', 'vs30'],
  // Abrahamson et al. (2016): Rrup for interface events; Rhypo and the hypocentral depth for intraslab ones.
  AGA16: (setting) =>
    setting === 'intraslab'
      ? ['magnitude', 'rhypoKm', 'hypoDepthKm', 'vs30']
      : ['magnitude', 'rrupKm', 'vs30'],
};

/** Assumptions that matter through what is derived from them (see the defaults above). */
const FEEDS: Readonly<Record<string, readonly string[]>> = {
  mechanism: ['rakeDeg', 'dipDeg'],
  ztorKm: ['rrupKm'],
  hypoDepthKm: ['rhypoKm'],
};
