import { renderWithProviders, screenText } from '../../utils/render';

import { screen } from '@testing-library/react-native';

import HealthCharts from '@/components/health/health-charts';
import { StationHealthView } from '@/components/health/station-health-view';

import { healthFixture, silentAlert } from './fixtures';

const nowMs = Date.parse('2026-12-02T10:00:05Z');

type Node = { type: string; props: Record<string, unknown>; children: (Node | string)[] | null };
function find(node: Node | Node[] | string | null, match: (n: Node) => boolean, out: Node[] = []): Node[] {
  if (!node || typeof node === 'string') return out;
  if (Array.isArray(node)) {
    node.forEach((n) => find(n, match, out));
    return out;
  }
  if (match(node)) out.push(node);
  (node.children ?? []).forEach((c) => find(c, match, out));
  return out;
}
const textOf = (node: Node | string): string => (typeof node === 'string' ? node : (node.children ?? []).map(textOf).join(''));

describe('StationHealthView', () => {
  it('when the station reports, draws both 24-hour charts with a UTC time axis', () => {
    // the chart file is what the view loads lazily; rendered directly here (the rendered tree, not text queries)
    const view = renderWithProviders(<HealthCharts series={healthFixture().series} nowMs={nowMs} width={600} clockLimitMs={1000} />);
    expect(screen.getByLabelText(/^Clock offset over the last 24 hours \(UTC\): 3 readings from 30\.0 to 42\.4 ms/)).toBeTruthy();
    expect(screen.getByLabelText(/^Temperature over the last 24 hours \(UTC\): 3 readings from 22\.8 to 23\.5 °C/)).toBeTruthy();
    const tree = view.toJSON() as Node;
    const svgTexts = find(tree, (n) => n.type === 'text').map(textOf);
    expect(svgTexts.filter((t) => t === 'Time (UTC)')).toHaveLength(2);
    expect(svgTexts).toEqual(expect.arrayContaining(['12:00', '00:00', '03:00']));
    expect(find(tree, (n) => n.type === 'svg' && (n.children ?? []).length > 0)).toHaveLength(2);
    expect(find(tree, (n) => n.type === 'path').length).toBeGreaterThanOrEqual(2);
  });

  it('when there are no readings yet, says so instead of drawing an empty chart', () => {
    renderWithProviders(<HealthCharts series={[]} nowMs={nowMs} width={600} />);
    expect(screenText()).toContain('No readings in the last 24 hours.');
  });

  it('when an alert is open and another resolved, lists the open one first and the other in the history', () => {
    const resolved = {
      ...silentAlert,
      id: 4,
      rule: 'clock-offset' as const,
      message: 'The device clock is 1400 ms off (limit 1000 ms): check its time source.',
      resolvedAt: '2026-12-02T08:00:00.000Z',
    };
    renderWithProviders(
      <StationHealthView
        health={healthFixture({ online: false, heartbeatAgeS: 2400, alerts: [silentAlert, resolved] })}
        nowMs={nowMs}
        readOnly
        onSaveSettings={async () => {}}
      />,
    );
    const text = screenText();
    expect(text).toMatch(/Offline.*Heard 40 min ago/);
    expect(text).toMatch(/Open alerts\s*Silent while scheduled\s*No word from the device for over 30 minutes/);
    expect(text).toMatch(/Alert history \(24 h\)\s*Clock off · resolved\s*The device clock is 1400 ms off/);
    expect(text).toContain('resolved 2026-12-02 08:00 UTC');
    // a club admin sees the thresholds, not the form
    expect(text).toContain("Only the station's owner can change these thresholds.");
    expect(screen.queryByLabelText('Save thresholds')).toBeNull();
  });

  it('when the station has no device, says so and offers to create a token', () => {
    renderWithProviders(
      <StationHealthView
        health={healthFixture({ hasDevice: false, online: false, heartbeatAgeS: null, lastHeartbeatAt: null, series: [], recent: [] })}
        nowMs={nowMs}
        readOnly={false}
        onSaveSettings={async () => {}}
        onOpenDevice={() => {}}
      />,
    );
    expect(screenText()).toContain('No device yet');
    expect(screen.getByLabelText('Create a device token')).toBeTruthy();
  });
});
