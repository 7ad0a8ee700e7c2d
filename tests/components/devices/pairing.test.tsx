import { errorResponse, jsonResponse, renderWithProviders, screenText, stubFetch } from '../../utils/render';

import { fireEvent, screen, waitFor } from '@testing-library/react-native';

import { PairCodeFormView } from '@/components/devices/pair-code-form';
import { PairingReview } from '@/components/devices/pairing-review';
import { useLookUpPairing } from '@/components/devices/queries';
import type { PairingRequestView } from '@/shared/schemas';

function CodeHarness({ initialCode = '' }: { initialCode?: string }) {
  const lookUp = useLookUpPairing();
  return <PairCodeFormView initialCode={initialCode} onLookup={lookUp} />;
}

const request: PairingRequestView = {
  userCode: 'KMTD-RZWP',
  targetKind: 'station',
  model: 'QB-2',
  firmware: '0.9.1',
  requestedAtUtc: '2026-12-02T12:00:00.000Z',
  expiresAtUtc: '2026-12-02T12:10:00.000Z',
  targets: [{ kind: 'station', id: 7, name: 'Porch beacon', callsign: 'Q7PRC', hasToken: true }],
};

describe('PairCodeFormView', () => {
  it('when the code has vowels or the wrong length, says what a code looks like and asks the server nothing', async () => {
    const { calls } = stubFetch(() => jsonResponse(200, request));
    renderWithProviders(<CodeHarness />);
    fireEvent.changeText(screen.getByLabelText('Pairing code'), 'abcd-efgh');
    fireEvent.press(screen.getByLabelText('Find the device'));
    await waitFor(() => expect(screenText()).toContain('A pairing code has 8 letters'));
    expect(calls).toHaveLength(0);
  });

  it('when the server knows no such code, shows its one sentence beside the field', async () => {
    const { calls } = stubFetch(() => errorResponse(404, 'not-found', 'No device is waiting with this code.'));
    renderWithProviders(<CodeHarness />);
    fireEvent.changeText(screen.getByLabelText('Pairing code'), 'kmtd-rzwp');
    fireEvent.press(screen.getByLabelText('Find the device'));
    await waitFor(() => expect(screenText()).toContain('No device is waiting with this code.'));
    expect(calls[0].url).toBe('/api/pairing/KMTD-RZWP'); // typed in lower case, sent as the device shows it
  });

  it('when it arrives with the code from the device’s link, looks it up at once', async () => {
    const { calls } = stubFetch(() => jsonResponse(200, request));
    renderWithProviders(<CodeHarness initialCode="KMTD-RZWP" />);
    await waitFor(() => expect(calls).toHaveLength(1));
    expect(calls[0]).toMatchObject({ url: '/api/pairing/KMTD-RZWP', method: 'GET' });
  });
});

describe('PairingReview', () => {
  it('shows what is asking and says a station with a device would have it replaced; approve waits for a choice', () => {
    renderWithProviders(
      <PairingReview
        request={request}
        selectedId={null}
        onSelect={jest.fn()}
        onApprove={jest.fn()}
        onRefuse={jest.fn()}
        onOtherCode={jest.fn()}
        approving={false}
        refusing={false}
      />,
    );
    expect(screenText()).toContain('QB-2');
    expect(screenText()).toContain('0.9.1');
    expect(screenText()).toContain('2026-12-02 12:10 UTC');
    expect(screenText()).toContain('it would be replaced');
    expect(screen.getByLabelText('Approve the device')).toBeDisabled(); // no station chosen yet
    expect(screen.getByLabelText('Refuse the device')).not.toBeDisabled();
  });
});
