import { renderWithProviders, screenText } from '../../utils/render';

import { fireEvent, screen, waitFor } from '@testing-library/react-native';

import { InviteForm } from '@/components/clubs/invite-form';
import { ApiError } from '@/shared/api/client';

const field = () => screen.getByLabelText('E-mail of the person to invite');

describe('InviteForm', () => {
  it('when the admin sends an address that is not an e-mail, says what to fix and sends nothing', async () => {
    const onSubmit = jest.fn().mockResolvedValue(undefined);
    renderWithProviders(<InviteForm onSubmit={onSubmit} />);
    fireEvent.changeText(field(), 'tobin-at-example');
    fireEvent.press(screen.getByLabelText('Send invitation'));
    await waitFor(() => expect(screenText()).toContain('Enter a valid e-mail address'));
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('when the field is empty, asks for an address', async () => {
    const onSubmit = jest.fn();
    renderWithProviders(<InviteForm onSubmit={onSubmit} />);
    fireEvent.press(screen.getByLabelText('Send invitation'));
    await waitFor(() => expect(screenText()).toContain('Enter a valid e-mail address'));
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('when the address is valid, sends it in lower case and confirms', async () => {
    const onSubmit = jest.fn().mockResolvedValue(undefined);
    renderWithProviders(<InviteForm onSubmit={onSubmit} />);
    fireEvent.changeText(field(), '  New.Member@Test.Faintline.Example ');
    fireEvent.press(screen.getByLabelText('Send invitation'));
    await waitFor(() => expect(onSubmit).toHaveBeenCalledWith({ email: 'new.member@test.faintline.example' }));
    await waitFor(() => expect(screenText()).toContain('Invitation sent to new.member@test.faintline.example.'));
  });

  it('when the server refuses the address, shows its message beside the field', async () => {
    const onSubmit = jest.fn().mockRejectedValue(new ApiError(409, 'conflict', 'Conflict', { email: 'This person is already a member' }));
    renderWithProviders(<InviteForm onSubmit={onSubmit} />);
    fireEvent.changeText(field(), 'ilse@test.faintline.example');
    fireEvent.press(screen.getByLabelText('Send invitation'));
    await waitFor(() => expect(screenText()).toContain('This person is already a member'));
  });
});
