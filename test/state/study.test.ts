import { describe, expect, it } from 'vitest';
import { restore } from '../../src/document';
import { runStudy, startStudy, studyChoices, suggestedRange, type StudyReply } from '../../src/state/study';
import { cliJson, kiln } from '../cli/studyHelpers';

// The app's studies run the command line's studies: same numbers, with progress.

function checked(file: unknown) {
  const read = restore(file);
  if (!read.ok) throw new Error(read.errors[0].message);
  return read.sketch;
}

describe('studyChoices', () => {
  it('offers what the file lets a study vary, in matrix order, then positions, then settings', () => {
    const choices = studyChoices(checked(kiln()));
    expect(choices.map((c) => c.address)).toEqual([
      'hearth.temperature',
      'hearth.emissivity',
      'wall.heatFlux',
      'wall.emissivity',
      'crown.emissivity',
      'ware stack.2.temperature',
      'ware stack.2.emissivity',
      'hearth.x',
      'hearth.y',
      'wall.x',
      'wall.y',
      'crown.x',
      'crown.y',
      'ware stack.2.x',
      'ware stack.2.y',
      'settings.surroundingsTemperature',
      'settings.depth',
    ]);
    const ware = choices.find((c) => c.address === 'ware stack.2.x')!;
    expect(ware).toMatchObject({
      label: "position x of the shape of 'ware stack.2'",
      unit: 'm',
      current: 1.5,
      geometry: true,
    });
    expect(suggestedRange(ware)).toEqual([1.2, 1.8]);
    expect(suggestedRange(choices.find((c) => c.address === 'hearth.emissivity')!)).toEqual([0.55, 0.95]);
  });
});

describe('runStudy', () => {
  it('a sweep gives the numbers sweep --json prints, and reports progress after each value', () => {
    const file = kiln();
    const progress: number[] = [];
    const reply = runStudy(
      { kind: 'sweep', sketch: checked(file), address: 'hearth.temperature', from: 1150, to: 1350, steps: 3 },
      (done, total) => progress.push(done / total),
    );
    expect(progress).toEqual([1 / 3, 2 / 3, 1]);
    if (reply.kind !== 'sweep') throw new Error(reply.kind === 'failed' ? reply.message : reply.kind);
    const cli = cliJson(
      { 'k.json': file },
      ...['sweep', 'k.json', '--vary', 'hearth.temperature', '--from', '1150', '--to', '1350', '--steps', '3'],
    ) as { values: number[]; runs: { surfaces: { netHeat: number; temperature: number }[] }[] };
    expect(reply.table.values).toEqual(cli.values);
    expect(reply.table.netHeat).toEqual(cli.runs.map((r) => r.surfaces.map((s) => s.netHeat)));
    expect(reply.table.temperature).toEqual(cli.runs.map((r) => r.surfaces.map((s) => s.temperature)));
  });

  it('aiming at a value gives solve-for --json value and every root', () => {
    const file = kiln();
    const reply = runStudy({
      kind: 'solve',
      sketch: checked(file),
      address: 'hearth.temperature',
      from: 1100,
      to: 1400,
      steps: 16,
      surface: 'ware stack.2',
      quantity: 'netHeat',
      target: -150000,
    });
    const cli = cliJson(
      { 'k.json': file },
      ...['solve-for', 'k.json', '--vary', 'hearth.temperature', '--from', '1100', '--to', '1400'],
      ...['--target', 'ware stack.2.netHeat=-150000'],
    ) as { value: number };
    if (reply.kind !== 'solve') throw new Error(reply.kind === 'failed' ? reply.message : reply.kind);
    expect(reply.answer.value).toBe(cli.value);
    expect(reply.answer.values).toEqual([cli.value]);
    const m = /^temperature of 'hearth' = (\S+) K gives net heat of 'ware stack.2' = (\S+) W\/m$/.exec(
      reply.answer.summary,
    );
    expect(m).not.toBeNull();
    // The value is found to 1e-9 of itself; net heat goes about as T^4 / (T^4 - 700^4), 4.6 times faster here,
    // so the net heat reached is within 1e-8 of the target.
    expect(Math.abs(Number(m![2]) + 150000)).toBeLessThanOrEqual(1e-8 * 150000);
  });

  it('refuses with the same words as the command line', () => {
    const reply = runStudy({
      kind: 'sweep',
      sketch: checked(kiln()),
      address: 'crown.temperature',
      from: 1,
      to: 2,
      steps: 2,
    });
    expect(reply).toEqual({
      kind: 'failed',
      message:
        "'crown' has no temperature condition to vary; give it a temperature in the file first (it is adiabatic)",
    });
  });
});

describe('startStudy without workers (in-line)', () => {
  it('replies once at the end, after progress; a stopped study never replies', async () => {
    const request = {
      kind: 'sweep',
      sketch: checked(kiln()),
      address: 'hearth.emissivity',
      from: 0.5,
      to: 0.9,
      steps: 2,
    } as const;
    const replies: StudyReply['kind'][] = [];
    await new Promise<void>((done) =>
      startStudy(request, (r) => {
        replies.push(r.kind);
        if (r.kind !== 'progress') done();
      }),
    );
    expect(replies).toEqual(['progress', 'progress', 'sweep']);
    const late: StudyReply[] = [];
    startStudy(request, (r) => late.push(r)).stop();
    await new Promise((r) => setTimeout(r, 20));
    expect(late).toEqual([]);
  });
});
