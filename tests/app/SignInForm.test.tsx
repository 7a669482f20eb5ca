import { SignInForm } from '@/components/auth/SignInForm';
import { ApiError } from '@/lib/api/client';
import { fireEvent, render, screen, waitFor } from '@/tests/test-utils';

describe('SignInForm', () => {
  it('shows a message beside each empty field and does not submit', async () => {
    const onSubmit = jest.fn();
    render(<SignInForm onSubmit={onSubmit} error={null} />);
    fireEvent.press(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('Enter your e-mail address.')).toBeOnTheScreen();
    expect(screen.getByText('Enter your password.')).toBeOnTheScreen();
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('submits cleaned values', async () => {
    const onSubmit = jest.fn().mockResolvedValue(undefined);
    render(<SignInForm onSubmit={onSubmit} error={null} />);
    fireEvent.changeText(screen.getByLabelText('E-mail'), ' Juno@Brewery.TEST ');
    fireEvent.changeText(screen.getByLabelText('Password'), 'secret-pass');
    fireEvent.press(screen.getByRole('button', { name: 'Sign in' }));
    await waitFor(() => expect(onSubmit).toHaveBeenCalledWith({ email: 'juno@brewery.test', password: 'secret-pass' }));
  });

  it("shows the server's message and puts field messages on their fields", async () => {
    const failure = new ApiError(400, 'invalid_input', 'One field needs attention.', {
      email: 'The server did not like this address.',
    });
    const onSubmit = jest.fn().mockRejectedValue(failure);
    const { rerender } = render(<SignInForm onSubmit={onSubmit} error={null} />);
    fireEvent.changeText(screen.getByLabelText('E-mail'), 'a@b.test');
    fireEvent.changeText(screen.getByLabelText('Password'), 'whatever');
    fireEvent.press(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('The server did not like this address.')).toBeOnTheScreen();
    rerender(<SignInForm onSubmit={onSubmit} error={failure} />);
    expect(screen.getByText('One field needs attention.')).toBeOnTheScreen();
  });
});
