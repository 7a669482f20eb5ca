import { ForgotPasswordForm } from '@/components/auth/EmailForm';
import { NewPasswordForm } from '@/components/auth/NewPasswordForm';
import { SignUpForm } from '@/components/auth/SignUpForm';
import { PasswordForm, ProfileForm } from '@/components/profile/ProfileForms';
import { ApiError } from '@/lib/api/client';
import { fireEvent, render, screen, waitFor } from '@/tests/test-utils';

describe('SignUpForm', () => {
  it('asks for every field, then sends them cleaned', async () => {
    const onSubmit = jest.fn().mockResolvedValue(undefined);
    render(<SignUpForm onSubmit={onSubmit} error={null} />);
    fireEvent.press(screen.getByRole('button', { name: 'Create brewery account' }));
    expect(await screen.findByText('Enter your e-mail address.')).toBeOnTheScreen();
    expect(onSubmit).not.toHaveBeenCalled();
    fireEvent.changeText(screen.getByLabelText('Brewery name'), 'Larkspur Ferments');
    fireEvent.changeText(screen.getByLabelText('Your name'), 'Olwen Test');
    fireEvent.changeText(screen.getByLabelText('E-mail'), 'Olwen@Larkspur.TEST');
    fireEvent.changeText(screen.getByLabelText('Password'), 'correct-horse-1');
    fireEvent.press(screen.getByRole('button', { name: 'Create brewery account' }));
    await waitFor(() =>
      expect(onSubmit).toHaveBeenCalledWith(
        expect.objectContaining({
          breweryName: 'Larkspur Ferments',
          email: 'olwen@larkspur.test',
          password: 'correct-horse-1',
        }),
      ),
    );
  });
});

describe('ForgotPasswordForm', () => {
  it('puts the server’s message on the address', async () => {
    const onSubmit = jest.fn().mockRejectedValue(
      new ApiError(400, 'invalid_input', 'One field needs attention.', {
        email: 'This address cannot receive mail.',
      }),
    );
    render(<ForgotPasswordForm onSubmit={onSubmit} error={null} />);
    fireEvent.changeText(screen.getByLabelText('E-mail'), 'someone@brewery.test');
    fireEvent.press(screen.getByRole('button', { name: 'Send reset link' }));
    expect(await screen.findByText('This address cannot receive mail.')).toBeOnTheScreen();
  });
});

describe('NewPasswordForm', () => {
  it('refuses a short password and sends the token with the new one', async () => {
    const onSubmit = jest.fn().mockResolvedValue(undefined);
    render(
      <NewPasswordForm
        token="a-one-time-token-from-the-link"
        withName={false}
        submitLabel="Set password"
        onSubmit={onSubmit}
        error={null}
      />,
    );
    fireEvent.changeText(screen.getByLabelText('New password'), 'short');
    fireEvent.press(screen.getByRole('button', { name: 'Set password' }));
    expect(await screen.findByText(/at least 8 characters/)).toBeOnTheScreen();
    expect(onSubmit).not.toHaveBeenCalled();
    fireEvent.changeText(screen.getByLabelText('New password'), 'a-longer-password');
    fireEvent.press(screen.getByRole('button', { name: 'Set password' }));
    await waitFor(() =>
      expect(onSubmit).toHaveBeenCalledWith(
        expect.objectContaining({ token: 'a-one-time-token-from-the-link', password: 'a-longer-password' }),
      ),
    );
  });
});

describe('ProfileForms', () => {
  it('saves a trimmed name', async () => {
    const onSubmit = jest.fn().mockResolvedValue(undefined);
    render(<ProfileForm name="Juno Marsh" onSubmit={onSubmit} error={null} saved={false} />);
    fireEvent.changeText(screen.getByLabelText('Name'), '  Juno M. Marsh ');
    fireEvent.press(screen.getByRole('button', { name: 'Save name' }));
    await waitFor(() => expect(onSubmit).toHaveBeenCalledWith({ name: 'Juno M. Marsh' }));
  });

  it('wants a new password different from the current one', async () => {
    const onSubmit = jest.fn().mockResolvedValue(undefined);
    render(<PasswordForm onSubmit={onSubmit} error={null} saved={false} />);
    fireEvent.changeText(screen.getByLabelText('Current password'), 'same-password-1');
    fireEvent.changeText(screen.getByLabelText('New password'), 'same-password-1');
    fireEvent.press(screen.getByRole('button', { name: 'Change password' }));
    expect(await screen.findByText('Choose a password different from the current one.')).toBeOnTheScreen();
    expect(onSubmit).not.toHaveBeenCalled();
  });
});
