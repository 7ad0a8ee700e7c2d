import { renderWithProviders, screenText } from '../../utils/render';

import { fireEvent, screen } from '@testing-library/react-native';

import { FleetHealth } from '@/components/health/fleet-health';
import { ageInWords } from '@/components/health/words';

import { healthFixture, silentAlert } from './fixtures';

const online = healthFixture();
const offline = healthFixture({
  stationId: 12,
  stationName: 'Shed rig',
  callsign: 'Q2TRY',
  online: false,
  heartbeatAgeS: 2 * 3600 + 300,
  alerts: [silentAlert],
});
const noDevice = healthFixture({
  stationId: 13,
  stationName: 'Garden mast',
  hasDevice: false,
  online: false,
  lastHeartbeatAt: null,
  heartbeatAgeS: null,
  clockOffsetMs: null,
  temperatureC: null,
  driftHz: null,
  series: [],
  recent: [],
});

describe('ageInWords', () => {
  it.each([
    [null, 'never'],
    [0, '0 s ago'],
    [12, '12 s ago'],
    [59.6, '1 min ago'],
    [4 * 60 + 10, '4 min ago'],
    [2 * 3600 + 300, '2 h 5 min ago'],
    [8 * 3600 + 60, '8 h ago'],
    [3 * 86_400, '3 d ago'],
  ])('when the age is %p s, reads %p', (ageS, words) => {
    expect(ageInWords(ageS)).toBe(words);
  });
});

describe.each(['cards', 'table'] as const)('FleetHealth as %s', (layout) => {
  it('when stations are online, offline and without a device, shows each state with its age', () => {
    renderWithProviders(
      <FleetHealth fleet={[online, offline, noDevice]} layout={layout} onOpenStation={() => {}} onOpenDevice={() => {}} />,
    );
    const text = screenText();
    expect(text).toMatch(/Attic beacon.*Online.*Heard 12 s ago/);
    expect(text).toMatch(/Shed rig.*Offline.*Heard 2 h 5 min ago/);
    expect(text).toMatch(/Garden mast.*No device.*No device yet/);
    expect(text).toContain('+42 ms');
    expect(text).toContain('23.5 °C');
    expect(text).toContain('±1.7 Hz');
    expect(text).toContain('1 as planned, 1 unplanned');
  });

  it("when a station has an open alert, shows the alert's message in plain words", () => {
    renderWithProviders(<FleetHealth fleet={[online, offline]} layout={layout} onOpenStation={() => {}} />);
    expect(screenText()).toContain('Silent while scheduled');
    expect(screenText()).toContain('No word from the device for over 30 minutes while it is scheduled to transmit.');
  });

  it('when the operator presses a station or "create a token", calls back with its id', () => {
    const onOpenStation = jest.fn();
    const onOpenDevice = jest.fn();
    renderWithProviders(
      <FleetHealth fleet={[online, noDevice]} layout={layout} onOpenStation={onOpenStation} onOpenDevice={onOpenDevice} />,
    );
    fireEvent.press(screen.getByLabelText('Health of Attic beacon'));
    // the visible label (shorter in the table), then whose station
    fireEvent.press(screen.getByLabelText(`${layout === 'table' ? 'Create token' : 'Create a device token'} for Garden mast`));
    expect(onOpenStation).toHaveBeenCalledWith(11);
    expect(onOpenDevice).toHaveBeenCalledWith(13);
  });
});
