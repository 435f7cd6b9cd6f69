// @vitest-environment jsdom
import { afterEach, describe, expect, it, vi } from 'vitest';
import { act, cleanup, configure, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { renderApp } from './renderApp';
import { cliJson, kiln, runCli } from '../cli/studyHelpers';
import type { SketchFile } from '../../src/state/sketchFile';
import { resetStudies } from '../../src/state/study';

vi.mock('../../src/ui/canvas/SketchCanvas', () => ({ SketchCanvas: () => <div data-testid="canvas-stub" /> }));

configure({ asyncUtilTimeout: 8000 });
afterEach(() => {
  cleanup();
  resetStudies(); // studies outlive the panel (module state): each test starts with none
  vi.restoreAllMocks();
});

// The "What if" tab runs the command line's studies on the sketch on screen.

async function openStudies() {
  const user = userEvent.setup();
  const app = renderApp();
  act(() => app.store.getState().edit(() => kiln() as SketchFile));
  await user.click(screen.getByRole('tab', { name: 'What if' }));
  return { user, ...app };
}

async function setField(user: ReturnType<typeof userEvent.setup>, label: RegExp, text: string) {
  const field = screen.getByRole('textbox', { name: label });
  await user.clear(field);
  await user.type(field, text);
}

describe('the What if tab', () => {
  it('sweeps the hearth temperature: table and plot match sweep --json, CSV download matches sweep --csv', async () => {
    const { user } = await openStudies();
    await user.selectOptions(screen.getByRole('combobox', { name: /vary/i }), "temperature of 'hearth' (K)");
    await setField(user, /^from/i, '1150');
    await setField(user, /^to/i, '1350');
    await setField(user, /^steps/i, '5');
    await user.click(screen.getByRole('button', { name: 'Run' }));
    const table = await screen.findByRole('table', { name: 'Study results per value' });
    const argv = ['sweep', 'k.json', '--vary', 'hearth.temperature', '--from', '1150', '--to', '1350', '--steps', '5'];
    const cli = cliJson({ 'k.json': kiln() }, ...argv) as { runs: { surfaces: { name: string; netHeat: number }[] }[] };
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows).toHaveLength(5);
    rows.forEach((row, k) => {
      const cells = within(row)
        .getAllByRole('cell')
        .map((c) => Number(c.textContent));
      expect(cells).toEqual(cli.runs[k].surfaces.map((s) => Number(s.netHeat.toPrecision(6))));
    });
    // One line per surface; hiding one removes its line and its column.
    const plot = screen.getByRole('img', { name: /line plot/i });
    expect(plot.querySelectorAll('path')).toHaveLength(4);
    await user.click(screen.getByRole('checkbox', { name: 'crown' }));
    expect(plot.querySelectorAll('path')).toHaveLength(3);
    expect(within(table).queryByRole('columnheader', { name: /crown/ })).toBeNull();

    let saved: Blob | undefined;
    URL.createObjectURL = vi.fn((b: Blob) => {
      saved = b;
      return 'blob:study';
    });
    URL.revokeObjectURL = vi.fn();
    vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(() => {});
    await user.click(screen.getByRole('button', { name: 'Download study CSV' }));
    expect(await saved!.text()).toBe(runCli({ 'k.json': kiln() }, ...argv, '--csv').out);
  });

  it('aims the ware net heat at -150 kW/m by the hearth temperature, as solve-for does', async () => {
    const { user } = await openStudies();
    await user.selectOptions(screen.getByRole('combobox', { name: /vary/i }), "temperature of 'hearth' (K)");
    await setField(user, /^from/i, '1100');
    await setField(user, /^to/i, '1400');
    await user.selectOptions(screen.getByRole('combobox', { name: /surface/i }), 'ware stack.2');
    await setField(user, /value to aim for/i, '-150000');
    await user.click(screen.getByRole('button', { name: 'Find' }));
    const status = await screen.findByRole('status', { name: 'Value found' });
    const cli = cliJson(
      { 'k.json': kiln() },
      ...['solve-for', 'k.json', '--vary', 'hearth.temperature', '--from', '1100', '--to', '1400'],
      ...['--target', 'ware stack.2.netHeat=-150000'],
    ) as { value: number };
    expect(status.textContent).toContain(`temperature of 'hearth' = ${Number(cli.value.toPrecision(10))} K`);
  });

  it('refuses a range it cannot use, before running', async () => {
    const { user } = await openStudies();
    await setField(user, /^steps/i, '1');
    expect(screen.getByRole<HTMLButtonElement>('button', { name: 'Run' }).disabled).toBe(true);
    expect(screen.getByText(/Steps: a whole number from 2 to 1000/)).toBeTruthy();
    await waitFor(() => expect(screen.queryByRole('table', { name: 'Study results per value' })).toBeNull());
  });

  it('keeps the study and the fields typed while another tab is open', async () => {
    const { user } = await openStudies();
    await user.selectOptions(screen.getByRole('combobox', { name: /vary/i }), "emissivity of 'crown'");
    await setField(user, /^steps/i, '3');
    await user.click(screen.getByRole('button', { name: 'Run' }));
    await user.click(screen.getByRole('tab', { name: 'Surfaces' }));
    await user.click(screen.getByRole('tab', { name: 'What if' }));
    const table = await screen.findByRole('table', { name: 'Study results per value' });
    expect(within(table).getAllByRole('row')).toHaveLength(4);
    expect(screen.getByRole<HTMLInputElement>('textbox', { name: /^steps/i }).value).toBe('3');
    expect(screen.getByRole<HTMLSelectElement>('combobox', { name: /vary/i }).value).toBe('crown.emissivity');
  });

  it('works out which input matters: the table is sensitivity --json, to four digits', async () => {
    const { user } = await openStudies();
    await user.click(screen.getByRole('button', { name: 'Work it out' }));
    const table = await screen.findByRole('table', { name: 'Change of net heat per input' });
    const cli = cliJson({ 'k.json': kiln() }, 'sensitivity', 'k.json') as {
      rows: { parameter: string; unit: string; netHeat: number[] }[];
    };
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows.map((r) => within(r).getByRole('rowheader').textContent)).toEqual(cli.rows.map((r) => r.parameter));
    rows.forEach((row, k) => {
      const cells = within(row)
        .getAllByRole('cell')
        .map((c) => c.textContent);
      expect(cells[0]).toBe(cli.rows[k].unit);
      expect(cells.slice(1).map(Number)).toEqual(cli.rows[k].netHeat.map((d) => Number(d.toPrecision(4))));
    });
  });
});
