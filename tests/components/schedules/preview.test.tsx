import { renderWithProviders, screenText } from '../../utils/render';

import { screen, waitFor } from '@testing-library/react-native';

import { AirtimeSummary } from '@/components/schedules/airtime-summary';
import { NextTransmissions } from '@/components/schedules/next-transmissions';
import type { BandId } from '@/shared/domain';

import { NOW_MS } from './fixtures';

const tx = (iso: string, bandId: BandId) => ({
  startMs: Date.parse(iso),
  bandId,
  carrierHz: bandId === '20m' ? 14_097_100 : 7_040_100,
  audioOffsetHz: 1500,
  messageText: 'Q1IMW IO91 23',
});

describe('NextTransmissions', () => {
  it('when given a fixed now, counts down to the next transmission in mm:ss and lists UTC start times', async () => {
    const now = () => NOW_MS; // 14:02:48 UTC
    renderWithProviders(
      <NextTransmissions
        now={now}
        transmissions={[tx('2026-12-02T14:00:01Z', '40m'), tx('2026-12-02T14:06:01Z', '20m'), tx('2026-12-02T14:16:01Z', '40m')]}
      />,
    );

    await waitFor(() => expect(screen.getByLabelText(/^Next transmission in 03:13, at 14:06 UTC on 20 m/)).toBeTruthy());
    const text = screenText();
    expect(text).toContain('03:13');
    expect(text).toContain('14:16 UTC');
    expect(text).not.toContain('14:00 UTC'); // already started
  });

  it('when nothing is coming, says why', () => {
    renderWithProviders(
      <NextTransmissions now={() => NOW_MS} transmissions={[]} quietMessage="The schedule is paused: resume it to transmit." />,
    );
    expect(screenText()).toContain('The schedule is paused: resume it to transmit.');
  });
});

describe('AirtimeSummary', () => {
  it('when given a plan, shows minutes per band and day, the count, and the effective duty', () => {
    const transmissions = [
      ...Array.from({ length: 5 }, (_, i) => tx(`2026-12-02T0${i}:10:01Z`, '20m')),
      tx('2026-12-02T20:00:01Z', '40m'),
      tx('2026-12-03T20:00:01Z', '40m'),
    ];
    renderWithProviders(
      <AirtimeSummary plan={{ transmissions, slotsInSchedule: 1440, usableSlots: 700 }} days={['2026-12-02', '2026-12-03']} />,
    );

    // 162 symbols of 8192/12000 s = 110.6 s each
    expect(screen.getByLabelText('20 m: 2026-12-02 9.2 min, 2026-12-03 0.0 min')).toBeTruthy();
    expect(screen.getByLabelText('40 m: 2026-12-02 1.8 min, 2026-12-03 1.8 min')).toBeTruthy();
    const text = screenText();
    expect(text).toContain('5×');
    // 7 of 1440 slots, 7 of 700 usable ones
    expect(text).toContain('0.5 %');
    expect(text).toContain('1.0 %');
  });
});
