import { renderWithProviders, screenText } from '../../utils/render';

import { fireEvent, screen, waitFor } from '@testing-library/react-native';

import { ClubForm } from '@/components/clubs/club-form';
import { ApiError } from '@/shared/api/client';

const club = { name: 'Saltmarsh Beacon Circle', maxPowerDbm: 30 };
const powerField = () => screen.getByLabelText('Power limit for members (dBm)');

describe('ClubForm for an existing club', () => {
  it('when the admin lowers the power limit, sends the club values with the new limit and says it is saved', async () => {
    const onSubmit = jest.fn().mockResolvedValue(undefined);
    renderWithProviders(<ClubForm initialValues={club} submitLabel="Save club settings" onSubmit={onSubmit} />);
    expect(screen.getByLabelText('Club name').props.value).toBe('Saltmarsh Beacon Circle');
    expect(powerField().props.value).toBe('30');
    fireEvent.changeText(powerField(), '23');
    fireEvent.press(screen.getByLabelText('Save club settings'));
    await waitFor(() => expect(onSubmit).toHaveBeenCalledWith({ name: 'Saltmarsh Beacon Circle', maxPowerDbm: 23 }));
    await waitFor(() => expect(screenText()).toContain('Saved. The review uses the new limit at once.'));
  });

  it('when the limit is not a whole number in range, says what to fix and sends nothing', async () => {
    const onSubmit = jest.fn();
    renderWithProviders(<ClubForm initialValues={club} submitLabel="Save club settings" onSubmit={onSubmit} />);
    fireEvent.changeText(powerField(), '75');
    fireEvent.press(screen.getByLabelText('Save club settings'));
    await waitFor(() => expect(screenText()).toContain('The power limit is at most 60 dBm (1 kW)'));
    fireEvent.changeText(powerField(), 'one watt');
    fireEvent.press(screen.getByLabelText('Save club settings'));
    await waitFor(() => expect(screenText()).toContain('Give the limit as a number of dBm, such as 30'));
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('when the server refuses the name, shows its message beside the field and no saved note', async () => {
    const onSubmit = jest
      .fn()
      .mockRejectedValue(new ApiError(400, 'bad-request', 'Check the form', { name: 'Give the club a name of at least 3 characters' }));
    renderWithProviders(<ClubForm initialValues={club} submitLabel="Save club settings" onSubmit={onSubmit} />);
    fireEvent.changeText(screen.getByLabelText('Club name'), 'Saltmarsh');
    fireEvent.press(screen.getByLabelText('Save club settings'));
    await waitFor(() => expect(screenText()).toContain('Give the club a name of at least 3 characters'));
    expect(screenText()).not.toContain('Saved.');
  });
});
