import '../../utils/render';

import { applyServerErrors } from '@/components/form/apply-server-errors';
import { ApiError } from '@/shared/api/client';

function fakeForm(values: Record<string, string>) {
  const setError = jest.fn();
  return { form: { setError, getValues: () => values }, setError };
}

describe('applyServerErrors', () => {
  it("when a 400 names the form's fields, puts each message on its field", () => {
    const { form, setError } = fakeForm({ email: '', password: '' });

    applyServerErrors(form as never, new ApiError(400, 'bad-request', 'Check the fields', { email: 'Taken' }));

    expect(setError).toHaveBeenCalledWith('email', { type: 'server', message: 'Taken' }, { shouldFocus: true });
    expect(setError).toHaveBeenCalledTimes(1);
  });

  it('when the error names no known field, shows the message at form level', () => {
    const { form, setError } = fakeForm({ email: '' });

    applyServerErrors(form as never, new ApiError(409, 'conflict', 'An account with this e-mail exists'));

    expect(setError).toHaveBeenCalledWith('root.server', { type: 'server', message: 'An account with this e-mail exists' });
  });

  it('when a field is not in the form, keeps its message at form level beside the placed ones', () => {
    const { form, setError } = fakeForm({ password: '' });

    applyServerErrors(
      form as never,
      new ApiError(400, 'bad-request', 'Check the fields', { password: 'Too short', token: 'The link expired' }),
    );

    expect(setError).toHaveBeenCalledWith('password', { type: 'server', message: 'Too short' }, { shouldFocus: true });
    expect(setError).toHaveBeenCalledWith('root.server', { type: 'server', message: 'The link expired' });
  });

  it('when it is not an API error, shows a generic message', () => {
    const { form, setError } = fakeForm({});

    applyServerErrors(form as never, new TypeError('boom'));

    expect(setError).toHaveBeenCalledWith('root.server', {
      type: 'server',
      message: 'Something went wrong. Please try again.',
    });
  });
});
