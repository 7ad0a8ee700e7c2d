import { renderWithProviders, screenText } from '../../utils/render';

import { screen } from '@testing-library/react-native';

import { ConflictList } from '@/components/clubs/conflict-list';
import type { ClubConflicts } from '@/components/clubs/queries';

const data: ClubConflicts = {
  fromUtc: '2026-12-03T06:00:00.000Z',
  conflicts: [
    {
      a: 1,
      b: 2,
      bandId: '20m',
      slotCount: 12,
      firstSlotUtc: '2026-12-03T06:10:00.000Z',
      aStation: { name: 'Attic beacon', owner: 'Ilse Marrow', callsign: 'Q1AAA' },
      bStation: { name: 'Shed rig', owner: 'Club Admin', callsign: 'Q2BBB' },
    },
  ],
  proposals: [
    { stationId: 1, currentOffsetHz: 1500, proposedOffsetHz: 1530, stationName: 'Attic beacon', mine: false, meets: ['Shed rig'] },
    { stationId: 2, currentOffsetHz: 1500, proposedOffsetHz: 1470, stationName: 'Shed rig', mine: true, meets: ['Attic beacon'] },
  ],
  unresolved: [],
};

describe('ConflictList proposals', () => {
  it('names the station each proposal parts it from, and never offers the admin a proposal to themself', () => {
    renderWithProviders(<ConflictList data={data} sendState={{}} onPropose={() => undefined} />);
    const text = screenText();
    expect(text).toContain('Parts it from Shed rig.');
    expect(text).toContain('Parts it from Attic beacon.');
    expect(screen.getByLabelText('Propose 1530 Hz to the owner of Attic beacon')).toBeTruthy();
    expect(screen.queryByLabelText('Propose 1470 Hz to the owner of Shed rig')).toBeNull();
    expect(text).toContain('Your own station: set 1470 Hz yourself');
  });
});
