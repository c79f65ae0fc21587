import { modelCatalog } from '../engine/motion/registry.ts';
import { probeMotion } from '../engine/motion/probe.ts';
import { choiceOption, numberOption, requiredNumber, sig, verbArgs } from './args.ts';
import { EXIT_OK, type Io } from './output.ts';

export const MOTION_USAGE = `tremora motion --model NAME --magnitude M --rjb KM [options] [--json]

Evaluates one ground-motion model: median and sigma for each measure.
  --model NAME        a model name (${modelCatalog.names.join(', ')})
  --magnitude M       moment magnitude
  --rjb KM            Joyner-Boore distance, km
  --rrup KM --rx KM --ry0 KM --rhypo KM   other distances (defaults derived from --rjb, listed in the output)
  --vs30 M/S          site Vs30 (default 760)
  --mechanism KIND    strike-slip, reverse or normal (default strike-slip)
  --dip DEG --ztor KM --width KM --depth KM   rupture dip, top depth, width, hypocentral depth
  --setting NAME      crustal, interface or intraslab (default: the model's first)
  --measures LIST     comma-separated, e.g. PGA,PGV,SA(1.0)
With --json: per measure the median in g (PGV in cm/s) and the total, between- and within-event
sigma in natural-log units.`;

const DISTANCE_NAMES = { rjbKm: 'Rjb', rrupKm: 'Rrup', rhypoKm: 'Rhypo (hypocentral)' } as const;

export async function motionVerb(args: readonly string[], io: Io): Promise<number> {
  const { values } = verbArgs(args, {
    strings: [
      'model',
      'magnitude',
      'rjb',
      'rrup',
      'rx',
      'ry0',
      'rhypo',
      'vs30',
      'mechanism',
      'dip',
      'ztor',
      'width',
      'depth',
      'setting',
      'measures',
    ],
    booleans: ['json'],
    positionals: false,
  });
  const optional = <K extends string>(key: K, value: number | undefined) =>
    value === undefined ? {} : { [key]: value };
  const mechanism = choiceOption(values, 'mechanism', [
    'strike-slip',
    'reverse',
    'normal',
  ] as const);
  const setting = choiceOption(values, 'setting', ['crustal', 'interface', 'intraslab'] as const);
  const result = probeMotion(
    {
      model: values.model ?? '',
      magnitude: requiredNumber(values, 'magnitude'),
      rjbKm: requiredNumber(values, 'rjb'),
      ...optional('rrupKm', numberOption(values, 'rrup')),
      ...optional('rxKm', numberOption(values, 'rx')),
      ...optional('ry0Km', numberOption(values, 'ry0')),
      ...optional('rhypoKm', numberOption(values, 'rhypo')),
      ...optional('vs30', numberOption(values, 'vs30')),
      ...optional('dipDeg', numberOption(values, 'dip')),
      ...optional('ztorKm', numberOption(values, 'ztor')),
      ...optional('widthKm', numberOption(values, 'width')),
      ...optional('hypoDepthKm', numberOption(values, 'depth')),
      ...(mechanism ? { mechanism } : {}),
      ...(setting ? { setting } : {}),
      ...(values.measures ? { measures: values.measures.split(',').map((m) => m.trim()) } : {}),
    },
    modelCatalog,
  );
  if (values.json) {
    const measures = Object.fromEntries(
      Object.entries(result.measures).map(([k, m]) => [
        k,
        {
          median: m.median,
          unit: m.unit,
          sigma: m.sigma,
          tau: m.tau,
          phi: m.phi,
          applicable: m.applicable,
          notes: m.notes,
          derived: m.derived ?? null,
        },
      ]),
    );
    io.out(
      JSON.stringify(
        {
          model: result.model,
          input: result.input,
          defaults: result.defaults,
          unusedDefaults: result.unusedDefaults,
          distanceUsed: result.distanceUsed ?? null,
          measures,
        },
        null,
        2,
      ),
    );
    return EXIT_OK;
  }
  const i = result.input;
  io.out(`${result.model} — ${result.citation}`);
  io.out(
    `M ${i.magnitude} ${i.mechanism} (${i.setting}), Rjb ${sig(i.rjbKm)} km, Rrup ${sig(i.rrupKm)} km, Rhypo ${sig(i.rhypoKm)} km, Vs30 ${i.vs30} m/s`,
  );
  if (result.distanceUsed)
    io.out(
      `distance in the model's equations: ${DISTANCE_NAMES[result.distanceUsed]} ${sig(i[result.distanceUsed])} km`,
    );
  if (result.defaults.length > 0) io.out(`assumed: ${result.defaults.join('; ')}`);
  if (result.unusedDefaults.length > 0)
    io.out(
      `not read by ${result.model} for ${i.setting} earthquakes: ${result.unusedDefaults.map((d) => d.split(' ')[0]).join(', ')}`,
    );
  for (const [key, m] of Object.entries(result.measures)) {
    const otherNotes = m.notes.filter((n) => n !== m.derived);
    io.out(
      `  ${key.padEnd(9)} median ${sig(m.median)} ${m.unit}   sigma ${sig(m.sigma)} (tau ${sig(m.tau)}, phi ${sig(m.phi)})` +
        `${m.derived ? `   derived, not predicted by the model: ${m.derived}` : ''}${m.applicable ? '' : `   outside validity: ${otherNotes.join('; ')}`}`,
    );
  }
  return EXIT_OK;
}
