import type { TextKey } from './text-key.ts';

/**
 * Which pages show a text, derived from its key's prefix (the part before the first dot):
 * every view names its keys by the section it belongs to, so "visits.date" is shown where
 * the visit records are, on the community page and the overview. The map was built by
 * searching web/ for each prefix's keys; a test checks that every prefix of the English
 * bundle is in it. The values are the text keys of the pages' names.
 */
const EVERY = 'languages.page.every';
const HOME = 'nav.studies';
const OVERVIEW = 'nav.overview';
const COMMUNITY = 'languages.page.community';
const HANDOUT = 'languages.page.handout';
const SCENARIO = 'nav.scenario';
const CATALOG = 'nav.catalog';
const EDITOR = 'nav.edit';
const LIMITS = 'nav.limits';
const STUDY_FORM = 'languages.page.studyForm';
const RUN = 'languages.page.run';
const TRIP = 'languages.page.trip';

export const PAGES_BY_PREFIX: Readonly<Record<string, readonly TextKey[]>> = {
  site: [EVERY],
  nav: [EVERY],
  lang: [EVERY],
  footer: [EVERY],
  caution: [EVERY],
  numbers: [EVERY],
  access: ['languages.page.access'],
  band: [OVERVIEW, COMMUNITY, HANDOUT],
  catalog: [CATALOG],
  chance: [OVERVIEW, COMMUNITY, HANDOUT],
  place: [COMMUNITY, HANDOUT],
  compass: [COMMUNITY, HANDOUT],
  community: [COMMUNITY, HANDOUT, LIMITS],
  deleteStudy: [HOME, 'languages.page.deleteStudy'],
  draft: [OVERVIEW, EDITOR],
  duplicateStudy: [STUDY_FORM],
  newStudy: [STUDY_FORM],
  renameStudy: [STUDY_FORM],
  studyForm: [STUDY_FORM],
  studyActions: [HOME],
  home: [HOME],
  editor: [EDITOR],
  source: [EDITOR],
  motion: [EDITOR],
  error: ['languages.page.error'],
  firmness: [OVERVIEW, COMMUNITY],
  zoneDepths: [OVERVIEW],
  handout: [HANDOUT],
  hazardMap: [OVERVIEW],
  limits: [LIMITS, COMMUNITY],
  map: [OVERVIEW, SCENARIO],
  mapRun: [RUN],
  run: [RUN],
  mmi: [COMMUNITY, HANDOUT, SCENARIO],
  overview: [OVERVIEW, TRIP],
  plot: [COMMUNITY, CATALOG],
  priority: [OVERVIEW, TRIP],
  provenance: [COMMUNITY, HANDOUT],
  safety: [COMMUNITY, HANDOUT],
  tsunami: [COMMUNITY, HANDOUT],
  scenario: [SCENARIO],
  trip: [TRIP],
  visits: [COMMUNITY, OVERVIEW],
  faults: [EDITOR],
  material: [COMMUNITY, HANDOUT],
  languages: ['nav.languages'],
};

export const prefixOf = (key: string): string => key.slice(0, key.indexOf('.'));

/** The pages showing `key` (the names' text keys); none for a prefix not in the map. */
export const pagesOf = (key: TextKey): readonly TextKey[] => PAGES_BY_PREFIX[prefixOf(key)] ?? [];
