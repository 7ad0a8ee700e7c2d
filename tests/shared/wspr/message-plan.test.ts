import { planMessages } from '@/shared/domain/wspr/message-plan';

// Which types a station alternates: WSPR protocol description (K1JT); example texts are the description's own.
describe('planMessages', () => {
  it.each([
    [{ callsign: 'K1ABC', locator: 'FN42', powerDbm: 37 }, ['K1ABC FN42 37'], [1]],
    [{ callsign: 'k1abc', locator: 'fn42ab', powerDbm: 37 }, ['K1ABC FN42 37', '<K1ABC> FN42AB 37'], [1, 3]],
    [{ callsign: 'PJ4/K1ABC', locator: 'FK52UD', powerDbm: 37 }, ['PJ4/K1ABC 37', '<PJ4/K1ABC> FK52UD 37'], [2, 3]],
    [{ callsign: 'K1ABC/P', locator: 'FN42AB', powerDbm: '30' }, ['K1ABC/P 30', '<K1ABC/P> FN42AB 30'], [2, 3]],
  ])('when given %j, plans the messages to alternate', (input, texts, types) => {
    expect(planMessages(input)).toMatchObject({ ok: true, texts, types });
  });

  it('when the power is not a WSPR level, rounds it and reports the rounding', () => {
    expect(planMessages({ callsign: 'K1ABC', locator: 'FN42', powerDbm: 22 })).toMatchObject({
      ok: true,
      texts: ['K1ABC FN42 23'],
      power: { requestedDbm: 22, reportedDbm: 23, rounded: true, differenceDb: 1 },
    });
  });

  it.each([
    [{ callsign: 'KABC', locator: 'FN42', powerDbm: 37 }, /no digit/],
    [{ callsign: 'K1ABC', locator: 'ZZ99', powerDbm: 37 }, /locator/],
    [{ callsign: 'K1ABC', locator: 'FN42', powerDbm: 61 }, /0 to 60/],
    [{ callsign: 'PJ4/K1ABC/P', locator: 'FN42', powerDbm: 37 }, /only one/],
    [{ callsign: 'PJ4/K1ABC', locator: 'FK52', powerDbm: 37 }, /needs 6 characters/],
    [{ callsign: 'K1ABC', locator: 'FN4', powerDbm: 37 }, /4 or 6/],
  ])('when given %j, refuses and says what to fix', (input, reason) => {
    const r = planMessages(input);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.reason).toMatch(reason);
  });
});
