import { renderWithProviders, screenText } from '../../utils/render';

import { act } from '@testing-library/react-native';

import { readSlotClock } from '@/components/shell/slot-clock';
import { UtcClock } from '@/components/shell/utc-clock';

const at = (iso: string) => Date.parse(iso);

describe('readSlotClock', () => {
  it.each([
    ['2026-12-02T14:05:13.400Z', '14:05:13 UTC', '0:47'],
    ['2026-12-02T14:04:00.000Z', '14:04:00 UTC', '2:00'],
    ['2026-12-02T14:04:59.999Z', '14:04:59 UTC', '1:01'],
    ['2026-12-02T23:59:59.000Z', '23:59:59 UTC', '0:01'],
  ])('at %s shows %s and the next slot in %s', (iso, utc, countdown) => {
    expect(readSlotClock(at(iso))).toMatchObject({ utc, countdown });
  });
});

describe('UtcClock', () => {
  afterEach(() => jest.useRealTimers());

  it('when given a clock, shows that UTC time and the countdown to the next even minute', () => {
    renderWithProviders(<UtcClock now={() => at('2026-12-02T14:05:13.000Z')} />);

    expect(screenText()).toContain('14:05:13 UTC');
    expect(screenText()).toContain('next slot in 0:47');
  });

  it('when a second passes, ticks both the time and the countdown', () => {
    jest.useFakeTimers();
    jest.setSystemTime(at('2026-12-02T14:05:58.000Z'));
    renderWithProviders(<UtcClock />);
    expect(screenText()).toContain('next slot in 0:02');

    // the clock wakes a few ms after each whole second
    act(() => jest.advanceTimersByTime(1005));
    expect(screenText()).toContain('14:05:59 UTC');
    expect(screenText()).toContain('next slot in 0:01');

    act(() => jest.advanceTimersByTime(1000));
    expect(screenText()).toContain('14:06:00 UTC');
    expect(screenText()).toContain('next slot in 2:00');
  });
});
