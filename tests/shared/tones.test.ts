import { checkTonesInWindow, TONE_SPACING_HZ, toneFrequenciesHz } from '@/shared/domain/tones';

// Tone spacing 12000/8192 Hz and the window dial + 1400 … 1600 Hz: WSPR protocol description (K1JT).
describe('toneFrequenciesHz', () => {
  it('when the carrier is 14 097 100 Hz, spaces the four tones by 12000/8192 Hz', () => {
    expect(TONE_SPACING_HZ).toBe(1.46484375);
    expect(toneFrequenciesHz(14_097_100)).toEqual([14_097_100, 14_097_101.46484375, 14_097_102.9296875, 14_097_104.39453125]);
  });
});

describe('checkTonesInWindow', () => {
  it.each([
    [1500, true, 95.60546875],
    [1400, true, 0],
    [1596, false, -0.39453125],
    [1390, false, -10],
  ])('when the audio offset is %i Hz, says inside=%p with margin %p Hz', (offsetHz, inside, marginHz) => {
    const dialHz = 14_095_600;
    const check = checkTonesInWindow(dialHz, toneFrequenciesHz(dialHz + offsetHz));
    expect(check.inside).toBe(inside);
    expect(check.marginHz).toBeCloseTo(marginHz, 9);
  });
});
