export { loadStudy, type LoadResult, type LoadStudyOptions } from './load-study.ts';
export { readCommunitiesCsv } from './communities-csv.ts';
export { readSources } from './source-schema.ts';
export { IssueList, formatPath } from './issues.ts';
export { SITE_CLASS_VS30 } from './site-class.ts';
export { DEFAULT_SETTINGS } from './settings-schema.ts';
