import { renderWithProviders, screenText } from '../../utils/render';

import { zodResolver } from '@hookform/resolvers/zod';
import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import { useForm } from 'react-hook-form';
import { z } from 'zod';

import { PasswordForm } from '@/components/account/password-form';
import { submitWithServerErrors } from '@/components/form/apply-server-errors';
import { FormTextField } from '@/components/form/form-text-field';
import { NumberField } from '@/components/form/number-field';
import { ApiError } from '@/shared/api/client';

/** Enter as a browser hands it to react-native-web's text input (its keydown handler reads these). */
function enterOn(label: string) {
  let prevented = false;
  const event = {
    key: 'Enter',
    shiftKey: false,
    nativeEvent: { key: 'Enter', keyCode: 13, isComposing: false },
    target: { value: '', blur: () => {} },
    isDefaultPrevented: () => prevented,
    preventDefault: () => {
      prevented = true;
    },
    stopPropagation: () => {},
  };
  fireEvent(screen.getByLabelText(label), 'keyDown', event);
  return () => prevented;
}

/** Host elements with role="status" (RNTL's role queries do not read react-native-web's DOM hosts). */
const statusNodes = () => screen.UNSAFE_root.findAll((node) => typeof node.type === 'string' && node.props.role === 'status');

const schema = z.object({ name: z.string().min(1, 'Enter a name'), powerDbm: z.number(), notes: z.string() });
type Values = z.infer<typeof schema>;

function SmallForm({ onSubmit }: { onSubmit: (values: Values) => Promise<unknown> }) {
  const form = useForm<Values>({ resolver: zodResolver(schema), defaultValues: { name: '', powerDbm: 23, notes: '' } });
  submitWithServerErrors(form, onSubmit);
  return (
    <>
      <FormTextField control={form.control} name="name" label="Name" />
      <NumberField control={form.control} name="powerDbm" label="Power" />
      <FormTextField control={form.control} name="notes" label="Notes" multiline />
    </>
  );
}

describe('Enter submits the form (shared form kit)', () => {
  it('when Enter is pressed in any single-line text or number field, the form is submitted with its values', async () => {
    const onSubmit = jest.fn(async () => undefined);
    renderWithProviders(<SmallForm onSubmit={onSubmit} />);
    fireEvent.changeText(screen.getByLabelText('Name'), 'Attic');

    const prevented = enterOn('Name');
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    expect(onSubmit.mock.calls[0]).toEqual([{ name: 'Attic', powerDbm: 23, notes: '' }]);
    expect(prevented()).toBe(true);

    enterOn('Power');
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(2));
  });

  it('when Enter is pressed in a multi-line field, it stays a new line and nothing is sent', async () => {
    const onSubmit = jest.fn(async () => undefined);
    renderWithProviders(<SmallForm onSubmit={onSubmit} />);
    fireEvent.changeText(screen.getByLabelText('Name'), 'Attic');
    const prevented = enterOn('Notes');
    await new Promise((resolve) => setTimeout(resolve, 50));
    expect(onSubmit).not.toHaveBeenCalled();
    expect(prevented()).toBe(false);
  });

  it('when the values are invalid, Enter shows what to fix and sends nothing', async () => {
    const onSubmit = jest.fn(async () => undefined);
    renderWithProviders(<SmallForm onSubmit={onSubmit} />);
    enterOn('Name');
    await waitFor(() => expect(screenText()).toContain('Enter a name'));
    expect(onSubmit).not.toHaveBeenCalled();
  });
});

describe('PasswordForm', () => {
  it('when Enter is pressed in the first field, changes the password and says so in a status message', async () => {
    const onSubmit = jest.fn(async () => ({ ended: 2 }));
    renderWithProviders(<PasswordForm onSubmit={onSubmit} />);
    fireEvent.changeText(screen.getByLabelText('Current password'), 'correct-horse-battery');
    fireEvent.changeText(screen.getByLabelText('New password'), 'a-brand-new-password');
    enterOn('Current password');
    await waitFor(() =>
      expect(onSubmit).toHaveBeenCalledWith({ currentPassword: 'correct-horse-battery', newPassword: 'a-brand-new-password' }),
    );
    await waitFor(() => expect(statusNodes()).toHaveLength(1));
    expect(statusNodes()[0]).toHaveTextContent('Password changed. 2 other sessions were signed out.');
    expect(screen.getByLabelText('Current password').props.value).toBe('');
  });

  it('password fields turn off spell-check, correction and capitals, and name the kind of password', () => {
    renderWithProviders(<PasswordForm onSubmit={jest.fn()} />);
    const current = screen.getByLabelText('Current password');
    const next = screen.getByLabelText('New password');
    expect(current.props).toMatchObject({ autoComplete: 'current-password', spellCheck: false, autoCapitalize: 'none', type: 'password' });
    expect(next.props).toMatchObject({ autoComplete: 'new-password', spellCheck: false, autoCapitalize: 'none' });
  });

  it('when the server refuses the current password, puts its message beside that field', async () => {
    const onSubmit = jest.fn(async () => {
      throw new ApiError(400, 'bad-request', 'The password is not right', { currentPassword: 'This is not your current password' });
    });
    renderWithProviders(<PasswordForm onSubmit={onSubmit} />);
    fireEvent.changeText(screen.getByLabelText('Current password'), 'wrong-one-here');
    fireEvent.changeText(screen.getByLabelText('New password'), 'a-brand-new-password');
    fireEvent.press(screen.getByLabelText('Change password'));
    await waitFor(() => expect(screenText()).toContain('This is not your current password'));
    expect(statusNodes()).toHaveLength(0);
  });
});
