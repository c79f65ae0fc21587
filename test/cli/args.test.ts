import { describe, expect, it } from 'vitest';
import { verbArgs } from '../../api/cli/args.ts';

describe('verbArgs', () => {
  it('reads text, on/off and repeated options, and the file names', () => {
    const read = verbArgs(
      ['a.json', '--out', 'x.csv', '--json', '--source', 's1', '--source', 's2'],
      {
        strings: ['out'],
        booleans: ['json'],
        lists: ['source'],
      },
    );
    expect(read).toEqual({
      values: { out: 'x.csv', json: true, source: ['s1', 's2'] },
      positionals: ['a.json'],
    });
  });

  it('refuses an option it was not given, and a file name where the verb takes none', () => {
    expect(() => verbArgs(['--colour', 'red'], { strings: ['out'] })).toThrow(/--colour/);
    expect(() => verbArgs(['a.json'], { strings: ['out'], positionals: false })).toThrow(/a\.json/);
  });
});
