import { renderWithProviders, screenText } from '../../utils/render';

import { fireEvent, screen } from '@testing-library/react-native';

import { ReviewTable } from '@/components/clubs/review-table';
import type { ReviewRow } from '@/shared/schemas';

const base: Omit<ReviewRow, 'stationId' | 'stationName' | 'status' | 'bands' | 'findings'> = {
  callsign: 'Q1IMW',
  locator: 'IO91WM',
  ownerId: 2,
  ownerName: 'Ilse Marrow',
  transmitEnabled: true,
  suspension: null,
};
const rows: ReviewRow[] = [
  { ...base, stationId: 1, stationName: 'Attic beacon', status: 'ok', bands: ['40m'], findings: [] },
  {
    ...base,
    stationId: 2,
    stationName: 'Shed rig',
    ownerId: 3,
    ownerName: 'Tobin Reyle',
    callsign: 'Q2TRY',
    status: 'attention',
    bands: ['20m'],
    findings: [{ code: 'unfiltered-band', bandId: '20m', message: '20 m is enabled, but no low-pass filter covers it' }],
  },
  {
    ...base,
    stationId: 3,
    stationName: 'Garden mast',
    status: 'suspended',
    bands: ['20m', '30m'],
    transmitEnabled: false,
    suspension: { at: '2026-12-01T10:00:00.000Z', reason: 'Sends outside the window' },
    findings: [],
  },
];

function renderTable(layout: 'cards' | 'columns' = 'cards') {
  const onSuspend = jest.fn();
  const onLift = jest.fn();
  renderWithProviders(<ReviewTable rows={rows} layout={layout} stationHref={() => '/'} onSuspend={onSuspend} onLift={onLift} />);
  return { onSuspend, onLift };
}

describe('ReviewTable', () => {
  it('when nothing is filtered, lists every station with its verdict in words and the findings', () => {
    renderTable();
    const text = screenText();
    expect(text).toContain('Showing 3 of 3 stations');
    expect(text).toContain('Attic beacon');
    expect(text).toContain('Ready: nothing to fix on the enabled bands.');
    expect(text).toContain('Needs attention: one thing to fix before it may send.');
    expect(text).toContain('20 m is enabled, but no low-pass filter covers it');
    expect(text).toContain('Stopped by the club: Sends outside the window.');
  });

  it('when the admin filters by status "Needs attention", shows only that station and its finding', () => {
    renderTable();
    fireEvent.press(screen.getByLabelText('Status: Needs attention'));
    const text = screenText();
    expect(text).toContain('Showing 1 of 3 stations');
    expect(text).toContain('Shed rig');
    expect(text).toContain('no low-pass filter covers it');
    expect(text).not.toContain('Attic beacon');
    expect(text).not.toContain('Garden mast');
  });

  it('when the admin filters by band 20 m, hides stations that do not use it; with a status too, narrows further', () => {
    renderTable('columns');
    fireEvent.press(screen.getByLabelText('Band: 20 m'));
    let text = screenText();
    expect(text).toContain('Showing 2 of 3 stations');
    expect(text).not.toContain('Attic beacon');
    fireEvent.press(screen.getByLabelText('Status: Stopped'));
    text = screenText();
    expect(text).toContain('Showing 1 of 3 stations');
    expect(text).toContain('Garden mast');
    expect(text).not.toContain('Shed rig');
  });

  it('when no station matches, says so and how to widen the filter', () => {
    renderTable();
    fireEvent.press(screen.getByLabelText('Band: 30 m'));
    fireEvent.press(screen.getByLabelText('Status: Ready'));
    expect(screenText()).toContain('No station matches');
  });

  it('when the admin filters by member and presses Suspend or Lift, hands the right station back', () => {
    const { onSuspend, onLift } = renderTable();
    fireEvent.press(screen.getByLabelText('Member: Tobin Reyle'));
    expect(screenText()).not.toContain('Attic beacon');
    fireEvent.press(screen.getByLabelText('Suspend Shed rig'));
    expect(onSuspend).toHaveBeenCalledWith(expect.objectContaining({ stationId: 2 }));
    fireEvent.press(screen.getByLabelText('Member: Everyone'));
    fireEvent.press(screen.getByLabelText('Lift the stop on Garden mast'));
    expect(onLift).toHaveBeenCalledWith(expect.objectContaining({ stationId: 3 }));
  });
});
