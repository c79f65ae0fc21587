import { booleanPointInPolygon, polygon } from '@turf/turf';
import { faultSurface } from '../geometry/fault-surface.ts';
import { frameForStudy } from '../geometry/projection.ts';
import type { FaultSource, Recurrence, Source, Study, ZoneSource } from '../model.ts';
import { momentNm } from '../recurrence/seismic-moment.ts';
import { treeMagnitudeBins } from '../recurrence/tree-magnitude-bins.ts';
import { magnitudeAreaRelation, magnitudeForArea } from './magnitude-from-area.ts';

/** A warning about one source: its index, the field (relative to its properties) and what is odd. */
export interface SourceWarning {
  readonly sourceIndex: number;
  readonly field: string;
  readonly message: string;
}

/** b-values outside this range are unusual for tectonic seismicity (common practice). */
export const B_VALUE_USUAL = { min: 0.6, max: 1.4 } as const;
/** Mmax more than this many standard deviations above the area's median magnitude is warned of. */
export const MMAX_SIGMAS = 2;
/**
 * Long-term slip rates of crustal and intraslab faults from 0.01 to 50 mm/yr cover active faults
 * from the slowest intraplate ones to the fastest plate-boundary transforms (common practice).
 */
export const FAULT_SLIP_MM_YR = { min: 0.01, max: 50 } as const;
/**
 * Plate convergence runs from a few to about 150 mm/yr (DeMets, Gordon & Argus 2010, MORVEL,
 * from memory); an interface slipping seismically below 10 mm/yr needs a low coupling stated,
 * and above 150 mm/yr no plate moves so fast.
 */
export const INTERFACE_SLIP_MM_YR = { min: 10, max: 150 } as const;
/** Shear modulus for the moment of a recurrence that gives none, Pa (as moment balancing's default). */
const SHEAR_MODULUS_PA = 3.0e10;

const fmt = (x: number, digits = 2): string => String(+x.toFixed(digits));

/** Every value a parameter takes over the source's tree: the single one and its alternatives. */
function valuesOf(recurrence: Recurrence, key: 'mMax' | 'bValue'): number[] {
  const single = (recurrence as Partial<Record<typeof key, number>>)[key];
  const alternatives = recurrence.alternatives?.[key]?.map((a) => a.value) ?? [];
  return [
    ...new Set([
      ...(alternatives.length > 0 ? [] : single === undefined ? [] : [single]),
      ...alternatives,
    ]),
  ];
}

/** The magnitude range a recurrence covers (over its tree). */
function magnitudeRange(recurrence: Recurrence): [number, number] {
  if (recurrence.type === 'fixed') return [recurrence.magnitude, recurrence.magnitude];
  return [recurrence.mMin, Math.max(...valuesOf(recurrence, 'mMax'))];
}

/**
 * Slip rate (mm/yr) the recurrence's moment rate implies over `areaKm2`: Σ rate × M0 of its
 * mean bins (Hanks & Kanamori 1979) over μ × area (Brune 1968, from memory).
 */
function impliedSlipRateMmYr(
  recurrence: Recurrence,
  areaKm2: number,
  magnitudeStep: number,
): number {
  const bins = treeMagnitudeBins(recurrence, { magnitudeStep }, areaKm2);
  const momentRate = bins.magnitudes.reduce((s, m, i) => s + bins.annualRates[i]! * momentNm(m), 0);
  const mu = recurrence.type === 'moment-balanced' ? recurrence.shearModulusPa : SHEAR_MODULUS_PA;
  return (momentRate / (mu * areaKm2 * 1e6)) * 1e3;
}

function bValueWarnings(source: Source, sourceIndex: number): SourceWarning[] {
  return valuesOf(source.recurrence, 'bValue')
    .filter((b) => b < B_VALUE_USUAL.min || b > B_VALUE_USUAL.max)
    .map((b) => ({
      sourceIndex,
      field: 'recurrence.bValue',
      message: `source "${source.id}": b-value ${b} lies outside the usual ${B_VALUE_USUAL.min}–${B_VALUE_USUAL.max}; check it against the catalog`,
    }));
}

function faultWarnings(study: Study, fault: FaultSource, sourceIndex: number): SourceWarning[] {
  const out: SourceWarning[] = [];
  const areaKm2 = faultSurface(fault, frameForStudy(study)).areaKm2;
  const relation = magnitudeAreaRelation(fault.setting, fault.mechanism);
  const fits = magnitudeForArea(relation, areaKm2);
  const limit = fits + MMAX_SIGMAS * relation.sigma;
  const largest =
    fault.recurrence.type === 'fixed'
      ? [fault.recurrence.magnitude]
      : valuesOf(fault.recurrence, 'mMax');
  for (const m of largest.filter((m) => m > limit))
    out.push({
      sourceIndex,
      field: fault.recurrence.type === 'fixed' ? 'recurrence.magnitude' : 'recurrence.mMax',
      message: `source "${fault.id}": maximum magnitude ${m} exceeds what its ${fmt(areaKm2, 0)} km² surface allows: M ${fmt(fits)} by ${relation.name}, ${fmt(limit)} at ${MMAX_SIGMAS} standard deviations`,
    });

  const slip = impliedSlipRateMmYr(fault.recurrence, areaKm2, study.settings.magnitudeStep);
  const given = fault.recurrence.type === 'moment-balanced';
  const what = given
    ? `its slip rate of ${fmt(slip)} mm/yr`
    : `its rates imply a slip rate of ${fmt(slip)} mm/yr over its ${fmt(areaKm2, 0)} km² (moment rate over shear modulus × area)`;
  const range = fault.setting === 'interface' ? INTERFACE_SLIP_MM_YR : FAULT_SLIP_MM_YR;
  if ((fault.setting === 'interface' || !given) && (slip < range.min || slip > range.max))
    out.push({
      sourceIndex,
      field: 'recurrence',
      message:
        fault.setting === 'interface'
          ? `source "${fault.id}": ${what}, outside the ${range.min}–${range.max} mm/yr of plate convergence times coupling; check it against the convergence rate and the coupling`
          : `source "${fault.id}": ${what}, outside the ${range.min}–${range.max} mm/yr of active faults; check the rates against the fault's size`,
    });
  return out;
}

/** Whether any vertex of the fault's trace lies inside the zone's polygon. */
function faultInZone(fault: FaultSource, zone: ZoneSource): boolean {
  const shape = polygon(zone.rings.map((ring) => ring.map((p) => [...p])));
  return fault.trace.some((p) => booleanPointInPolygon([...p], shape));
}

function doubleCountingWarnings(study: Study): SourceWarning[] {
  const out: SourceWarning[] = [];
  study.sources.forEach((zone, z) => {
    if (zone.kind !== 'zone') return;
    const [zMin, zMax] = magnitudeRange(zone.recurrence);
    for (const fault of study.sources) {
      if (fault.kind !== 'fault' || fault.setting !== zone.setting || !faultInZone(fault, zone))
        continue;
      const [fMin, fMax] = magnitudeRange(fault.recurrence);
      const lo = Math.max(zMin, fMin);
      const hi = Math.min(zMax, fMax);
      if (hi <= lo) continue;
      out.push({
        sourceIndex: z,
        field: 'recurrence.mMax',
        message: `source "${zone.id}" (M ${zMin}–${zMax}) and the fault "${fault.id}" inside it (M ${fMin}–${fMax}) both have earthquakes of M ${lo}–${hi}: counted twice unless the zone's rates leave the fault's out (end the zone below M ${fMin}, or start the fault at M ${zMax})`,
      });
    }
  });
  return out;
}

/**
 * Warnings (never refusals) about a validated study's sources: b-values outside the usual
 * range, a fault's maximum magnitude beyond what its area allows, a fault's rates implying a
 * slip rate no active fault has, an interface slipping faster or slower than plates converge,
 * and a zone that repeats the magnitudes of the faults inside it.
 */
export function sourceSanity(study: Study): SourceWarning[] {
  const out: SourceWarning[] = [];
  study.sources.forEach((source, i) => {
    out.push(...bValueWarnings(source, i));
    if (source.kind === 'fault') out.push(...faultWarnings(study, source, i));
  });
  out.push(...doubleCountingWarnings(study));
  return out;
}
