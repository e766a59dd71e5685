import { act, type ReactElement } from 'react';
import { AppRegistry } from 'react-native';
import type { OverlayDriver } from '../../../shared/schemas/overlay';
import { createChartCursor } from '../../charts';
import type { StackCurves } from '../logic/curves';
import { DEFAULT_OPTIONS } from '../logic/stack-options';
import { CursorReadout } from './cursor-readout';

const grid = [100, 1000];
const curve = (slug: string, spl: number[]): StackCurves => ({
  slug, spl, offAxis: [], offsetDb: 0, impedance: [8.2, 6.5], thd: { driveLevelV: 2.83, thd: [1.25, 0.3], h2: null, h3: null },
});
const curves = [curve('a-1', [80, 84.25]), curve('b-2', [79, 90])];
// Only the names reach the readout.
const driver = (model: string) => ({ model, maker: { name: 'Invented Audio' }, set: { label: 'Sample A' } }) as unknown as OverlayDriver;
const drivers = [driver('IA-3M'), driver('IA-3P')];

// This suite renders through react-native-web, so the page is real DOM and a testID is a
// data-testid. The react-native testing library looks for native host views and finds none here, so
// the app registry mounts the component into a DOM node, as the web app itself starts.
(globalThis as { IS_REACT_ACT_ENVIRONMENT?: boolean }).IS_REACT_ACT_ENVIRONMENT = true;
AppRegistry.registerComponent('cursor-readout-test', () => ({ ui }: { ui: ReactElement }) => ui);
let host: HTMLDivElement;
// react-native-web's runApplication hands back the React root (typed void for native).
let app: { unmount: () => void } | undefined;
beforeEach(() => {
  host = document.createElement('div');
  document.body.appendChild(host);
});
afterEach(() => {
  act(() => app?.unmount());
  host.remove();
});
const render = (ui: ReactElement) =>
  act(() => {
    app = AppRegistry.runApplication('cursor-readout-test', { rootTag: host, initialProps: { ui } }) as unknown as typeof app;
  });
const byId = (id: string) => host.querySelector(`[data-testid="${id}"]`);
const text = (id: string) => byId(id)?.textContent ?? null;

describe('CursorReadout', () => {
  it('lays out every driver row before the cursor exists, so the first touch moves nothing', () => {
    const cursor = createChartCursor();
    render(<CursorReadout cursor={cursor} grid={grid} curves={curves} drivers={drivers} o={DEFAULT_OPTIONS} />);
    expect(byId('cursor-frequency')).toBeNull();
    expect(text('readout-0-spl')).toBe('—');
    expect(text('readout-1-z')).toBe('—');
    const rowsBefore = host.querySelectorAll('[data-testid^="readout-"]').length;

    act(() => cursor.set(900));
    expect(text('cursor-frequency')).toBe('1.00 kHz');
    expect(text('readout-0-spl')).toBe('84.3 dB');
    expect(text('readout-1-spl')).toBe('90.0 dB');
    expect(text('readout-0-thd')).toBe('0.30 %');
    expect(text('readout-1-z')).toBe('6.50 Ω');
    expect(text('readout-0')).toContain('IA-3M · Sample A · Invented Audio');
    // The same rows and cells, only their text changed.
    expect(host.querySelectorAll('[data-testid^="readout-"]').length).toBe(rowsBefore);
  });

  it('shows distortion in dB when asked', () => {
    const cursor = createChartCursor(100);
    const db = [{ ...curves[0], thd: { driveLevelV: 2.83, thd: [-38.06, -50.46], h2: null, h3: null } }];
    render(<CursorReadout cursor={cursor} grid={grid} curves={db} drivers={drivers.slice(0, 1)} o={{ ...DEFAULT_OPTIONS, thdUnit: 'db' }} />);
    expect(text('cursor-frequency')).toBe('100 Hz');
    expect(text('readout-0-thd')).toBe('-38.1 dB');
  });
});
