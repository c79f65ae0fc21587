import { z } from 'zod';
import type { Community, SiteClass } from '../engine/model.ts';
import type { SiteProxy } from '../engine/terrain/site-proxy.ts';
import { identifier, numberIn, oneOf, text, yesNo } from './fields.ts';
import { formatPath, type IssueList } from './issues.ts';
import { SITE_CLASSES, SITE_CLASS_VS30 } from './site-class.ts';

/**
 * A community's own fields (DESIGN.md section 2, plus siteClass), in the order of Tremora's
 * CSV header; the fields a community file's columns are matched to.
 */
export const COMMUNITY_COLUMNS = [
  'id',
  'name',
  'lon',
  'lat',
  'vs30',
  'siteClass',
  'population',
  'coastal',
  'elevationM',
] as const;
export type CommunityColumn = (typeof COMMUNITY_COLUMNS)[number];

/** The keys a community may carry: its own fields and the details its file gave. */
export const COMMUNITY_KEYS = [...COMMUNITY_COLUMNS, 'details'] as const;

/**
 * A community's details: what its file says that Tremora does not use (school, clinic,
 * airstrip, notes), kept as text and shown on its page. Bounded so that a wide spreadsheet
 * cannot swell a study.
 */
const detailsSchema = z
  .record(z.string().min(1).max(80), z.string().max(500, 'expected at most 500 characters'))
  .refine((d) => Object.keys(d).length <= 30, { message: 'expected at most 30 details' });

/**
 * Vs30 accepted from 50 to 5,000 m/s: beyond those it is surely a unit slip (ft/s, km/s).
 * Ground-motion models warn separately when a value leaves their own range.
 */
const VS30_RANGE = { min: 50, max: 5000, unit: 'm/s' } as const;

export const communitySchema = z.object({
  id: identifier(),
  name: text(120, 'a name'),
  lon: numberIn({ min: -180, max: 180, unit: 'degrees' }),
  lat: numberIn({ min: -90, max: 90, unit: 'degrees' }),
  vs30: numberIn(VS30_RANGE).optional(),
  siteClass: oneOf(SITE_CLASSES as readonly SiteClass[]).optional(),
  population: numberIn({ min: 0, max: 1e8, integer: true, unit: 'people' }).optional(),
  coastal: yesNo().optional(),
  elevationM: numberIn({ min: -500, max: 9000, unit: 'm' }).optional(),
  details: detailsSchema.optional(),
});

export type CommunityInput = z.output<typeof communitySchema>;

/** A validated community as the engine sees it; vs30 from the site class when not given. */
export function toCommunity(c: CommunityInput): Community {
  const vs30 = c.vs30 ?? SITE_CLASS_VS30[c.siteClass as SiteClass];
  return {
    id: c.id,
    name: c.name,
    lon: c.lon,
    lat: c.lat,
    vs30,
    vs30Basis: c.vs30 !== undefined ? 'measured' : 'site-class',
    ...(c.siteClass !== undefined ? { siteClass: c.siteClass } : {}),
    ...(c.population !== undefined ? { population: c.population } : {}),
    coastal: c.coastal ?? false,
    ...(c.elevationM !== undefined ? { elevationM: c.elevationM } : {}),
    ...(c.details !== undefined && Object.keys(c.details).length > 0 ? { details: c.details } : {}),
  };
}

/** Most communities one study may hold (a screening list, not a census). */
export const MAX_COMMUNITIES = 2000;

/** A community without vs30 or a site class, given the slope proxy's Vs30 at its place. */
function withProxy(community: Community, proxy: NonNullable<ReturnType<SiteProxy>>): Community {
  return {
    ...community,
    vs30: proxy.vs30,
    vs30Basis: 'slope-proxy',
    vs30Proxy: { slope: proxy.slope, siteClass: proxy.siteClass, vs30Range: proxy.vs30Range },
  };
}

/**
 * Validates a list of raw communities, each at `pathOf(index)`; reports every problem and
 * duplicate id, and returns the valid ones. With `proxy` (the study's terrain grid), a
 * community without vs30 or a site class takes the slope–Vs30 proxy at its place.
 */
export function readCommunities(
  raw: readonly unknown[],
  issues: IssueList,
  pathOf: (index: number) => readonly PropertyKey[],
  proxy?: SiteProxy,
): Community[] {
  const out: Community[] = [];
  const seen = new Map<string, number>();
  raw.forEach((item, index) => {
    issues.warnUnknownKeys(item, COMMUNITY_KEYS, pathOf(index));
    const parsed = issues.parse(communitySchema, item, pathOf(index));
    const given = (item ?? {}) as { vs30?: unknown; siteClass?: unknown };
    const hasSite = given.vs30 !== undefined || given.siteClass !== undefined;
    const estimate =
      hasSite || !parsed || proxy === undefined ? null : proxy([parsed.lon, parsed.lat]);
    // Checked outside the schema so it is reported alongside every other problem of the row.
    if (typeof item === 'object' && item !== null && !hasSite && estimate === null) {
      issues.add(
        [...pathOf(index), 'vs30'],
        proxy === undefined
          ? `expected vs30 (m/s) or siteClass (${SITE_CLASSES.join(', ')}), got neither (or name a terrain grid in the study for the slope–Vs30 proxy)`
          : `expected vs30 (m/s) or siteClass (${SITE_CLASSES.join(', ')}), got neither, and the study's terrain grid gives no slope here (off the grid, without data or below sea level)`,
      );
    }
    if (!parsed || (!hasSite && estimate === null)) return;
    const first = seen.get(parsed.id);
    if (first !== undefined) {
      issues.add(
        [...pathOf(index), 'id'],
        `duplicate id "${parsed.id}"; expected unique ids (first used at ${formatPath(pathOf(first))})`,
      );
      return;
    }
    seen.set(parsed.id, index);
    out.push(estimate === null ? toCommunity(parsed) : withProxy(toCommunity(parsed), estimate));
  });
  return out;
}
