/**
 * The name of the invented demo study (data-demo/demo.study.json; test/web/data/demo-study.test.ts
 * checks that they agree). Its pages say that its data are invented; a user's own study's do not.
 */
export const DEMO_STUDY_NAME = 'Demo coast';

export const isDemoStudy = (study: { readonly name: string } | undefined): boolean =>
  study?.name === DEMO_STUDY_NAME;
