import type { Study } from '../../api/engine/model.ts';
import { modelCatalog } from '../../api/engine/motion/registry.ts';
import { planScreening } from '../../api/engine/screening-plan.ts';
import { screenCommunities } from '../../api/engine/screen-study.ts';
import { readStudyFile } from '../../api/study/read-study-file.ts';
import { latticeCommunities, loadLine, machineLine } from './hazard-cases.ts';

/**
 * How the cost of a screening grows with the communities, the measures and the sources: the
 * demo study varied one way at a time, planned (the rupture table and the models' per-rupture
 * terms) and screened in this one thread. CPU time (`process.cpuUsage`) of the second of two
 * runs of each variant, so that the figures hold on a shared machine and the JIT is warm.
 * Prints figures; asserts nothing.
 *
 *   npm run bench -- scaling
 */
const loaded = await readStudyFile(
  new URL('../../data-demo/demo.study.json', import.meta.url).pathname,
  modelCatalog,
);
if (!loaded.ok) throw new Error('the demo study does not validate');
const demo = loaded.study;

const cpuMs = (used: NodeJS.CpuUsage): number => (used.user + used.system) / 1000;

function measure(study: Study): { ruptures: number; planMs: number; screenMs: number } {
  let figures = { ruptures: 0, planMs: 0, screenMs: 0 };
  for (let run = 0; run < 2; run++) {
    let cpu = process.cpuUsage();
    const plan = planScreening(study, { models: modelCatalog });
    const planMs = cpuMs(process.cpuUsage(cpu));
    cpu = process.cpuUsage();
    screenCommunities(plan, [...study.communities.keys()], {});
    figures = { ruptures: plan.ruptureCount, planMs, screenMs: cpuMs(process.cpuUsage(cpu)) };
  }
  return figures;
}

function row(label: string, study: Study): void {
  const { ruptures, planMs, screenMs } = measure(study);
  const communities = study.communities.length;
  console.log(
    `  ${label.padEnd(34)} ${String(ruptures).padStart(8)} ruptures  plan ${(planMs / 1000).toFixed(2).padStart(6)} s  screen ${(screenMs / 1000).toFixed(2).padStart(6)} s  (${(screenMs / communities).toFixed(0)} ms a community)`,
  );
}

console.log(machineLine());
console.log(loadLine());
console.log(
  '\nCPU time in one thread, second of two runs; the demo study varied one way at a time.',
);

console.log('\ncommunities (the demo sources, 4 measures; lattice communities over the demo area)');
row('11 (the demo villages)', demo);
for (const count of [22, 44])
  row(`${count}`, { ...demo, communities: latticeCommunities(demo, count, 'Scaling village') });

console.log('\nmeasures (the demo, 11 villages)');
const measures = demo.settings.measures;
for (const count of [1, 2])
  row(measures.slice(0, count).join(', '), {
    ...demo,
    settings: { ...demo.settings, measures: measures.slice(0, count) },
  });
row(measures.join(', '), demo);

console.log(
  '\nsources (the demo, 11 villages, 4 measures): the first source, then one more at a time in the study order',
);
demo.sources.forEach((source, i) =>
  row(`+ ${source.id} (${source.kind})`, { ...demo, sources: demo.sources.slice(0, i + 1) }),
);
console.log(`\n${loadLine()}`);
