import { errorResponse, jsonResponse, renderWithProviders, screenText, stubFetch } from '../../utils/render';

import { fireEvent, screen, waitFor } from '@testing-library/react-native';

import ProposalsRoute from '@/app/(tabs)/proposals';
import type { OffsetProposal } from '@/shared/schemas';

const pending: OffsetProposal = {
  id: 5,
  clubId: 1,
  clubName: 'Saltmarsh Beacon Circle',
  stationId: 12,
  stationName: 'Attic beacon',
  currentOffsetHz: 1500,
  proposedOffsetHz: 1537.5,
  reason: 'Separates this station from another club station in the same slots',
  status: 'pending',
  createdAt: '2026-12-02T14:05:00.000Z',
  decidedAt: null,
};

describe('/proposals', () => {
  it('when the owner presses Accept, posts the acceptance and shows the proposal as accepted', async () => {
    let current = pending;
    const { calls } = stubFetch((call) => {
      if (call.method === 'POST') current = { ...pending, status: 'accepted', decidedAt: '2026-12-02T15:00:00.000Z' };
      return call.method === 'POST' ? jsonResponse(200, current) : jsonResponse(200, [current]);
    });
    renderWithProviders(<ProposalsRoute />);
    await waitFor(() => expect(screen.getByLabelText('Accept 1537.5 Hz for Attic beacon')).toBeTruthy());
    expect(screenText()).toContain('1500 Hz → 1537.5 Hz');
    expect(screenText()).toContain('From Saltmarsh Beacon Circle · 2026-12-02 14:05 UTC');

    fireEvent.press(screen.getByLabelText('Accept 1537.5 Hz for Attic beacon'));
    await waitFor(() => expect(calls.some((call) => call.method === 'POST')).toBe(true));
    expect(calls.find((call) => call.method === 'POST')?.url).toBe('/api/offset-proposals/5/accept');
    await waitFor(() => expect(screenText()).toContain('Accepted: the station uses the new offset'));
  });

  it('when the owner presses Decline, posts the refusal', async () => {
    const { calls } = stubFetch((call) =>
      call.method === 'POST' ? jsonResponse(200, { ...pending, status: 'declined' }) : jsonResponse(200, [pending]),
    );
    renderWithProviders(<ProposalsRoute />);
    await waitFor(() => expect(screen.getByLabelText('Decline the new offset for Attic beacon')).toBeTruthy());
    fireEvent.press(screen.getByLabelText('Decline the new offset for Attic beacon'));
    await waitFor(() => expect(calls.find((call) => call.method === 'POST')?.url).toBe('/api/offset-proposals/5/decline'));
  });

  it('when the server refuses, shows its message by the proposal', async () => {
    stubFetch((call) =>
      call.method === 'POST' ? errorResponse(409, 'conflict', 'This proposal was already decided') : jsonResponse(200, [pending]),
    );
    renderWithProviders(<ProposalsRoute />);
    await waitFor(() => expect(screen.getByLabelText('Accept 1537.5 Hz for Attic beacon')).toBeTruthy());
    fireEvent.press(screen.getByLabelText('Accept 1537.5 Hz for Attic beacon'));
    await waitFor(() => expect(screenText()).toContain('This proposal was already decided'));
  });

  it('when there are no proposals, says what would bring one', async () => {
    stubFetch(() => jsonResponse(200, []));
    renderWithProviders(<ProposalsRoute />);
    await waitFor(() => expect(screenText()).toContain('No proposals'));
  });
});
