import { renderWithProviders, screenText } from '../../utils/render';

import { checkTonesInWindow, toneFrequenciesHz } from '@/shared/domain';

import { WindowGauge } from '@/components/workshop/window-gauge';

const dialHz = 7_038_600;
const gauge = (audioOffsetHz: number, extra: Partial<Parameters<typeof WindowGauge>[0]> = {}) => (
  <WindowGauge
    bandName="40 m"
    dialHz={dialHz}
    window={checkTonesInWindow(dialHz, toneFrequenciesHz(dialHz + audioOffsetHz))}
    toleranceHz={70.4}
    warmUpDriftHz={2.8}
    driftedWindow={checkTonesInWindow(dialHz, toneFrequenciesHz(dialHz + audioOffsetHz + 2.8))}
    calibrated
    {...extra}
  />
);

describe('WindowGauge', () => {
  it('when all four tones sit inside the window, says so with the margin in Hz', () => {
    renderWithProviders(gauge(1500));
    const text = screenText();
    // tones at +1500 … +1504.39: 95.6 Hz below the top edge
    expect(text).toContain('All four tones are inside the 40 m window, 95.6 Hz from the nearest edge.');
    expect(text).toContain('Warm-up drift for 10 °C: ±2.8 Hz; the tones stay inside (92.8 Hz to spare).');
    expect(text).not.toContain('Warning');
  });

  it('when a tone falls outside the window, shows a warning naming the tone and how far out it is', () => {
    renderWithProviders(gauge(1598));
    const text = screenText();
    expect(text).toContain('Warning: tone 2 is 0.9 Hz above the window; tone 3 is 2.4 Hz above the window.');
    expect(text).toContain('calibrate this band or change the audio offset');
    expect(text).not.toContain('All four tones are inside');
  });

  it('on an uncalibrated band whose tolerance spread crosses an edge, says the tones are only planned inside and asks for calibration', () => {
    // tones +1500 … +1504.4 Hz with ±70.4 Hz reach +1574.8 Hz: inside; at +1530 Hz they reach +1604.8 Hz, past the +1600 Hz edge
    renderWithProviders(gauge(1530, { calibrated: false }));
    const text = screenText();
    expect(text).toContain(
      'The four tones are planned inside the 40 m window, but the unit’s ±70.4 Hz tolerance could put them outside it',
    );
    expect(text).toContain('calibrate this band first');
    expect(text).not.toContain('All four tones are inside');
  });

  it('on an uncalibrated band whose tolerance spread stays inside, says the tones are inside even at the tolerance edge', () => {
    renderWithProviders(gauge(1500, { calibrated: false, toleranceHz: 20 }));
    expect(screenText()).toContain(
      'All four tones are inside the 40 m window, 95.6 Hz from the nearest edge (even at the edge of the unit’s tolerance).',
    );
  });

  it('when the unit states no temperature coefficient, says the warm-up drift is unknown', () => {
    renderWithProviders(gauge(1500, { warmUpDriftHz: null, driftedWindow: null }));
    expect(screenText()).toContain('the drift for a 10 °C warm-up is unknown');
  });
});
