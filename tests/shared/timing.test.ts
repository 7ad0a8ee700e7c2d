import {
  nextSlotStartMs,
  slotPosition,
  slotsInRange,
  slotStartAtOrAfterMs,
  slotStartMs,
  SYMBOL_PERIOD_MS,
  TX_DURATION_MS,
} from '@/shared/domain/timing';

const at = (iso: string): number => Date.parse(iso);

// Slot rules from the WSPR protocol description (K1JT): even UTC minutes, start 1 s in,
// 162 symbols of 8192/12000 s ≈ 110.6 s.
describe('timing constants', () => {
  it('when computing a transmission, lasts 162 × 8192/12000 s = 110.592 s', () => {
    expect(SYMBOL_PERIOD_MS).toBeCloseTo(682.6667, 3);
    expect(TX_DURATION_MS).toBeCloseTo(110_592, 6);
  });
});

describe('slotStartMs', () => {
  it.each([
    ['2024-03-01T12:00:00.000Z', '2024-03-01T12:00:00.000Z'],
    ['2024-03-01T12:01:59.999Z', '2024-03-01T12:00:00.000Z'],
    ['2024-03-01T12:02:00.000Z', '2024-03-01T12:02:00.000Z'],
    ['2024-03-01T23:59:30.000Z', '2024-03-01T23:58:00.000Z'],
  ])('when the instant is %s, starts the slot at %s', (instant, start) => {
    expect(slotStartMs(new Date(instant))).toBe(at(start));
  });
});

describe('nextSlotStartMs', () => {
  it.each([
    ['2024-03-01T12:00:00.000Z', '2024-03-01T12:02:00.000Z'],
    ['2024-03-01T12:00:00.001Z', '2024-03-01T12:02:00.000Z'],
    ['2024-03-01T23:59:00.000Z', '2024-03-02T00:00:00.000Z'],
  ])('when the instant is %s, the next slot starts at %s', (instant, next) => {
    expect(nextSlotStartMs(at(instant))).toBe(at(next));
  });

  it('when the instant is exactly a slot start, the at-or-after form keeps that slot', () => {
    expect(slotStartAtOrAfterMs(at('2024-03-01T12:00:00.000Z'))).toBe(at('2024-03-01T12:00:00.000Z'));
  });
});

describe('slotsInRange', () => {
  it('when the range is one UTC day, gives 720 slots', () => {
    expect(slotsInRange(at('2024-03-01T00:00:00Z'), at('2024-03-02T00:00:00Z')).length).toBe(720);
  });

  it('when every fifth slot is wanted, steps by ten minutes from the first slot', () => {
    const slots = Array.from(slotsInRange(at('2024-03-01T00:00:30Z'), at('2024-03-01T00:30:00Z'), 5));
    expect(slots).toEqual(['00:02', '00:12', '00:22'].map((hm) => at(`2024-03-01T${hm}:00Z`)));
  });

  it('when the range is empty, gives no slots', () => {
    expect(slotsInRange(at('2024-03-01T00:01:00Z'), at('2024-03-01T00:01:30Z')).length).toBe(0);
  });
});

describe('slotPosition', () => {
  it.each([
    ['2024-03-01T12:00:00.500Z', 'before-transmission', null],
    ['2024-03-01T12:00:01.000Z', 'transmitting', 0],
    ['2024-03-01T12:00:01.683Z', 'transmitting', 1],
    ['2024-03-01T12:01:51.591Z', 'transmitting', 161],
    ['2024-03-01T12:01:51.592Z', 'after-transmission', null],
  ])('when the instant is %s, is %s at symbol %p', (instant, phase, symbolIndex) => {
    expect(slotPosition(at(instant))).toMatchObject({ phase, symbolIndex, slotStartMs: at('2024-03-01T12:00:00Z') });
  });
});
