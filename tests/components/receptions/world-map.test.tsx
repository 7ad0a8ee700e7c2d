import { renderWithProviders, screenText } from '../../utils/render';

import { fireEvent, screen } from '@testing-library/react-native';
import { geoDistance } from 'd3-geo';

import WorldMap from '@/components/map/world-map';
import { mapFrame, projectPoint } from '@/components/map/projection';

import { reachFixture } from './fixtures';

const reach = reachFixture();

describe('world map of receivers', () => {
  it('shows a legend of the bands heard, and of SNR steps when coloured by SNR', () => {
    renderWithProviders(<WorldMap station={reach.station} receivers={reach.mapReceivers} width={360} />);
    expect(screen.getByLabelText(/World map: Q1IMW at IO91WM and 2 receivers/)).toBeOnTheScreen();
    expect(screenText()).toContain('Q1IMW (this station)');
    expect(screenText()).toContain('40 m');
    expect(screenText()).toContain('20 m');
    fireEvent.press(screen.getByLabelText('SNR'));
    expect(screenText()).toContain('below −24 dB');
    expect(screenText()).toContain('−6 dB and above');
  });

  it('when a receiver is pressed, shows who it is, how far and how well it heard', () => {
    renderWithProviders(<WorldMap station={reach.station} receivers={reach.mapReceivers} width={360} />);
    expect(screenText()).toContain('Point at a receiver');
    fireEvent.press(screen.getByLabelText('Receiver Q5KIW at FN31PR, 5,460 km, best SNR −26 dB'));
    expect(screenText()).toContain('5,460 km at 288° · 14 reports · best SNR −26 dB');
    expect(screenText()).toContain('20 m · last heard 2026-12-01 22:10 UTC');
  });

  it('puts the station on the centre meridian of the projection', () => {
    const frame = mapFrame(600, reach.station);
    const [x] = projectPoint(frame, reach.station)!;
    expect(x).toBeCloseTo(300, 0);
    // the antipode's meridian lands on the map's edges; d3-geo's own geoDistance confirms it is half the globe away
    expect(geoDistance([reach.station.lon, 0], [reach.station.lon + 180, 0])).toBeCloseTo(Math.PI, 6);
  });
});
