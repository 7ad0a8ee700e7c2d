import { describeChange, fieldChanges, labelFromKey } from '@/components/audit/change-sentences';

// Expected words are the product's own wording; band names follow the ITU band designations
// (common practice, no source); 20 m is 14 MHz, 40 m is 7 MHz.
const schedule = {
  name: 'Evening rotation',
  steps: [
    { bandId: '20m', slots: 1, activeHoursUtc: null },
    { bandId: '40m', slots: 2, activeHoursUtc: { fromHour: 18, toHour: 22 } },
  ],
  cadence: { kind: 'every-nth', nth: 3 },
  stagger: { stepHz: 0, spanHz: 0 },
  startDate: '2026-01-01',
  endDate: null,
  paused: false,
};

const text = (lines: { label: string; before: string | null; after: string | null }[]) =>
  lines.map((l) => `${l.label}: ${l.before ?? '∅'} → ${l.after ?? '∅'}`);

describe('change sentences, one reading per action kind', () => {
  it('schedule.create reads the rotation as a sentence and never as JSON', () => {
    const lines = text(describeChange({ action: 'schedule.create', before: null, after: schedule }));
    expect(lines[0]).toBe('Schedule: ∅ → 20 m for 1 slot, then 40 m for 2 slots (18:00–22:00 UTC), every 3rd slot');
    expect(lines.join('\n')).not.toMatch(/[{}[\]"]/);
    expect(lines).toContain('Name: ∅ → Evening rotation');
  });

  it('schedule.update shows only what changed, before and after', () => {
    const after = { ...schedule, cadence: { kind: 'every-slot' }, paused: true };
    expect(text(describeChange({ action: 'schedule.update', before: schedule, after }))).toEqual([
      'Schedule: 20 m for 1 slot, then 40 m for 2 slots (18:00–22:00 UTC), every 3rd slot → 20 m for 1 slot, then 40 m for 2 slots (18:00–22:00 UTC), every slot',
      'Schedule: running → paused',
    ]);
  });

  it('schedule.delete says what was there', () => {
    const lines = describeChange({ action: 'schedule.delete', before: schedule, after: null });
    expect(lines[0]).toEqual({ label: 'Schedule', before: expect.stringContaining('every 3rd slot'), after: null });
  });

  it('station.update names the fields and gives units', () => {
    const before = { name: 'Attic', callsign: 'Q1AAA', audioOffsetHz: 1500, transmitEnabled: false, region: 'itu1', notes: '' };
    const after = { ...before, audioOffsetHz: 1520, transmitEnabled: true };
    expect(text(describeChange({ action: 'station.update', before, after }))).toEqual([
      'Audio offset: 1500 Hz → 1520 Hz',
      'Transmitting: off → on',
    ]);
  });

  it('band.update reads enabled and calibration in words, without the band id', () => {
    const before = { bandId: '20m', enabled: false, calibrationOffsetHz: null };
    const after = { bandId: '20m', enabled: true, calibrationOffsetHz: -1.5 };
    expect(text(describeChange({ action: 'band.update', before, after }))).toEqual([
      'Band: disabled → enabled',
      'Calibration offset: not calibrated → \u22121.5 Hz',
    ]);
  });

  it('calibration.save gives one line per band with the offset it replaced', () => {
    const before = [
      { bandId: '20m', calibrationOffsetHz: 2 },
      { bandId: '40m', calibrationOffsetHz: null },
    ];
    const after = { referenceErrorPpm: null, offsets: [{ bandId: '40m', calibrationOffsetHz: 1.2 }] };
    expect(text(describeChange({ action: 'calibration.save', before, after }))).toEqual(['Calibration on 40 m: not calibrated → +1.2 Hz']);
  });

  it('unit.update reads filters and the reference in MHz', () => {
    const before = { name: 'Box', referenceHz: 25e6, filters: [{ bands: ['20m'], cutoffHz: 15e6 }] };
    const after = { ...before, filters: [{ bands: ['20m'], cutoffHz: 16e6 }] };
    const lines = describeChange({ action: 'unit.update', before, after });
    expect(lines).toHaveLength(1);
    expect(lines[0].label).toBe('Low-pass filters');
    expect(lines[0].before).toMatch(/^20 m: cut-off 15\.000\sMHz$/);
    expect(lines[0].after).toMatch(/^20 m: cut-off 16\.000\sMHz$/);
  });

  it('unit.filter-fitted counts filters from 1', () => {
    const lines = describeChange({
      action: 'unit.filter-fitted',
      before: { fittedFilter: null },
      after: { fittedFilter: { index: 1, atUtc: '2026-01-01T00:00:00Z' } },
    });
    expect(text(lines)).toEqual(['Fitted filter: none → filter no. 2']);
  });

  it('club.update, member.role, station.suspend and station.lift read as words', () => {
    expect(
      text(describeChange({ action: 'club.update', before: { name: 'C', maxPowerDbm: 30 }, after: { name: 'C', maxPowerDbm: 37 } })),
    ).toEqual(['Power limit: 30 dBm → 37 dBm']);
    expect(text(describeChange({ action: 'member.role', before: { role: 'member' }, after: { role: 'admin' } }))).toEqual([
      'Role: member → admin',
    ]);
    expect(
      text(
        describeChange({ action: 'station.suspend', before: { suspended: false }, after: { suspended: true, reason: 'Spurs on 40 m' } }),
      ),
    ).toEqual(['Station: not suspended → suspended', 'Reason: ∅ → Spurs on 40 m']);
    expect(text(describeChange({ action: 'station.lift', before: { suspended: true, reason: 'x' }, after: { suspended: false } }))).toEqual(
      ['Station: suspended → not suspended', 'Reason: x → ∅'],
    );
  });

  it('station.create and listening-post.delete list one side only', () => {
    expect(
      text(describeChange({ action: 'listening-post.delete', before: { name: 'Shed', callsign: 'Q2BBB', locator: 'JO01' }, after: null })),
    ).toEqual(['Name: Shed → ∅', 'Callsign: Q2BBB → ∅', 'Locator: JO01 → ∅']);
    const created = describeChange({ action: 'station.create', before: null, after: { name: 'Attic', notes: '', unitId: 4 } });
    expect(text(created)).toEqual(['Name: ∅ → Attic', 'Unit: ∅ → unit no. 4']);
  });

  it('actions whose summary says it all add no lines', () => {
    for (const action of ['photo.add', 'photo.delete', 'sessions.end-others']) {
      expect(describeChange({ action, before: { x: 1 }, after: { x: 2 } })).toEqual([]);
    }
    expect(describeChange({ action: 'device.revoke', before: null, after: null })).toEqual([]);
  });

  it('an unknown kind still reads field by field, without JSON', () => {
    const lines = describeChange({
      action: 'something.new',
      before: { widgetCount: 2, extra: { deepValue: true, list: [1, 2] } },
      after: { widgetCount: 3, extra: { deepValue: false, list: [] } },
    });
    expect(text(lines)).toEqual(['Widget count: 2 → 3', 'Extra: deep value yes, list 1, 2 → deep value no, list none']);
    expect(fieldChanges('a', 'b')).toEqual([{ label: 'Value', before: 'a', after: 'b' }]);
    expect(fieldChanges(null, null)).toEqual([]);
  });

  it('labels come from field names', () => {
    expect(labelFromKey('maxPowerDbm')).toBe('Max power dbm');
    expect(labelFromKey('serial_label')).toBe('Serial label');
  });
});
