import { z } from 'zod';
import { InvalidInput } from '../engine/errors.ts';
import { TECTONIC_SETTINGS } from '../engine/model.ts';
import type { ModelCatalog } from '../engine/motion/catalog.ts';
import type { ProbeRequest } from '../engine/motion/probe.ts';
import { describeValue, listOf, numberIn, oneOf } from '../study/fields.ts';
import { IssueList } from '../study/issues.ts';

/**
 * Accepted ranges are those of the study format (depths to 700 km, Vs30 50–5000 m/s) or of
 * physics (dip, rake); within them a model outside its own validity still answers, flagged
 * `applicable: false` (DESIGN.md section 3).
 */
const distanceKm = numberIn({ min: 0, max: 2000, unit: 'km' });
const depthKm = numberIn({ min: 0, max: 700, unit: 'km' });

const probeSchema = z.object({
  magnitude: numberIn({ min: 1, max: 10, unit: '(moment magnitude)' }),
  rjbKm: distanceKm,
  rrupKm: distanceKm.optional(),
  rxKm: numberIn({ min: -2000, max: 2000, unit: 'km' }).optional(),
  ry0Km: distanceKm.optional(),
  rhypoKm: distanceKm.optional(),
  vs30: numberIn({ min: 50, max: 5000, unit: 'm/s' }).optional(),
  mechanism: oneOf(['strike-slip', 'reverse', 'normal'] as const).optional(),
  rakeDeg: numberIn({ min: -180, max: 180, unit: 'degrees' }).optional(),
  dipDeg: numberIn({ min: 0, max: 90, minOpen: true, unit: 'degrees' }).optional(),
  ztorKm: depthKm.optional(),
  widthKm: numberIn({ min: 0, max: 1000, minOpen: true, unit: 'km' }).optional(),
  hypoDepthKm: depthKm.optional(),
  setting: oneOf(TECTONIC_SETTINGS).optional(),
  measures: listOf(
    z.string({
      error: (i) =>
        `expected a measure name such as "PGA" or "SA(0.2)", got ${describeValue(i.input)}`,
    }),
    1,
    20,
    'measures',
  ).optional(),
});

/** Keys a probe request may have. */
export const PROBE_KEYS = ['model', ...Object.keys(probeSchema.shape)];

/** Validates a ground-motion probe request against `models`; throws InvalidInput listing every problem. */
export function readProbeRequest(raw: Record<string, unknown>, models: ModelCatalog): ProbeRequest {
  const issues = new IssueList();
  for (const key of Object.keys(raw)) {
    if (!PROBE_KEYS.includes(key))
      issues.add([key], `unknown key; expected one of ${PROBE_KEYS.join(', ')}`);
  }
  const model = raw.model;
  if (typeof model !== 'string' || !models.find(model)) {
    issues.add(
      ['model'],
      `expected one of ${models.names.join(', ')}, got ${describeValue(model)}`,
    );
  }
  const fields = issues.parse(probeSchema, raw, []);
  if (issues.issues.length > 0 || !fields)
    throw new InvalidInput(issues.issues, 'invalid probe request');
  const request: Record<string, unknown> = { model };
  for (const [key, value] of Object.entries(fields)) if (value !== undefined) request[key] = value;
  return request as unknown as ProbeRequest;
}
