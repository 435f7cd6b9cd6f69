// @vitest-environment jsdom
// The flux profile in the Heat exchange results: a tube of the demo oven split
// into arcs from the Surfaces tab's edit, the plot and figures shown, and the
// profile checked against the oven's mirror symmetry (the demo is symmetric
// about x = 1.2 m: tube 2 at x = 0.95 mirrors tube 3 at x = 1.45, so the arc
// at angle a on one matches the arc at 180° - a on the other).
import { afterEach, describe, expect, it, vi } from 'vitest';
import { act, cleanup, configure, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { renderApp } from './renderApp';
import { splitSurfaceParts } from '../../src/state/edits/surfaceEdits';
import { exchangeProfile, facingAngle, type Profile } from '../../src/state/exchange/profile';

vi.mock('../../src/ui/canvas/SketchCanvas', () => ({ SketchCanvas: () => <div data-testid="canvas-stub" /> }));
configure({ asyncUtilTimeout: 8000 });
afterEach(() => cleanup());

describe('flux profile panel', () => {
  it('asks for a split first; then plots a split tube with peak, average and ratio', async () => {
    const user = userEvent.setup();
    const { store } = renderApp();
    await user.click(screen.getByRole('tab', { name: 'Heat exchange' }));
    const panel = () => screen.getByRole('region', { name: 'Flux profile' });
    await waitFor(() => expect(panel().textContent).toMatch(/split it into\s+parts/));
    act(() => store.getState().edit((d) => splitSurfaceParts(splitSurfaceParts(d, 'tube 2', 8)!, 'tube 3', 8)!));
    await waitFor(() => expect(within(panel()).getByRole('img')).toBeTruthy());
    expect(within(panel()).getByLabelText<HTMLSelectElement>('surface').value).toBe('tube 2');
    const ex = store.getState().exchange;
    if (ex.kind !== 'solved') throw new Error('the demo solves');
    const two = exchangeProfile(ex, store.getState().doc.shapes, 'tube 2') as Profile;
    const three = exchangeProfile(ex, store.getState().doc.shapes, 'tube 3') as Profile;
    expect(two.rows).toHaveLength(8);
    // Mirror symmetry: arc k of tube 2 (middle 22.5° + 45° k) matches arc 3 - k (mod 8) of tube 3.
    two.rows.forEach((r, k) => {
      const m = three.rows[(((3 - k) % 8) + 8) % 8];
      expect(m.at).toBeCloseTo(180 - r.at + (180 - r.at < 0 ? 360 : 0), 9);
      expect(Math.abs(m.flux - r.flux)).toBeLessThanOrEqual(1e-9 * Math.abs(r.flux));
    });
    // The tubes take heat up, most on the side facing the fired floor (180° to 360°).
    expect(two.average).toBeLessThan(0);
    expect(two.peakAt).toBeGreaterThan(180);
    expect(two.peakToAverage).toBeGreaterThan(1);
    expect(panel().textContent).toMatch(/peak-to-average\s*\d/);
    expect(within(panel()).getByRole('button', { name: 'Download profile CSV' })).toBeTruthy();
    // The fired floor's middle (1.2, 0) seen from tube 2's centre (0.95, 0.7): 360° - atan(0.7 / 0.25).
    const floorAngle = 360 - (Math.atan(0.7 / 0.25) * 180) / Math.PI;
    expect(facingAngle(store.getState().doc.shapes, 2, 'fired floor')).toBeCloseTo(floorAngle, 12);
    await user.selectOptions(within(panel()).getByLabelText('mark the side facing'), 'fired floor');
    expect(panel().textContent).toMatch(/° from the side facing fired floor/);
    // An arc of the next tube counts at its middle: tube 3's first arc (0° to 45°, radius 0.1) from 0.5 m away.
    const mid = Math.PI / 8;
    expect(facingAngle(store.getState().doc.shapes, 2, 'tube 3 1')).toBeCloseTo(
      (Math.atan2(0.1 * Math.sin(mid), 0.5 + 0.1 * Math.cos(mid)) * 180) / Math.PI,
      12,
    );
    await user.selectOptions(within(panel()).getByLabelText('surface'), 'tube 3');
    expect(within(panel()).getByLabelText<HTMLSelectElement>('surface').value).toBe('tube 3');
  });
});
