import { acceptInvitationSchema, signInSchema, signUpSchema } from '@/lib/schemas/auth';
import { changePasswordSchema, inviteSchema } from '@/lib/schemas/team';

const errorsOf = async (schema: { validate: (v: unknown, o: object) => Promise<unknown> }, value: unknown) => {
  try {
    await schema.validate(value, { abortEarly: false });
    return {};
  } catch (error) {
    const inner = (error as { inner: { path: string; message: string }[] }).inner;
    return Object.fromEntries(inner.map((e) => [e.path, e.message]));
  }
};

describe('shared schemas (the forms and the server use these same objects)', () => {
  it('clean e-mail addresses: trimmed and lower-cased', async () => {
    const value = await signInSchema.validate({ email: '  Ana@Brewery.TEST ', password: 'x' });
    expect(value.email).toBe('ana@brewery.test');
  });

  it('ask for passwords of 8 to 72 characters (NIST SP 800-63B minimum; bcrypt reads 72 bytes)', async () => {
    const base = { breweryName: 'Quill Ferments', name: 'A', email: 'a@b.test' };
    expect(await errorsOf(signUpSchema, { ...base, password: '1234567' })).toHaveProperty(
      'password',
      'Use at least 8 characters.',
    );
    expect(await errorsOf(signUpSchema, { ...base, password: 'x'.repeat(73) })).toHaveProperty('password');
    expect(await errorsOf(signUpSchema, { ...base, password: '12345678' })).toEqual({});
  });

  it('name every missing field of a sign-up', async () => {
    expect(Object.keys(await errorsOf(signUpSchema, {})).sort()).toEqual(['breweryName', 'email', 'name', 'password']);
  });

  it('accept only the three roles for an invitation', async () => {
    expect(await errorsOf(inviteSchema, { email: 'a@b.test', role: 'captain' })).toHaveProperty('role');
    expect(await errorsOf(inviteSchema, { email: 'a@b.test', role: 'brewer' })).toEqual({});
  });

  it('refuse a new password equal to the current one', async () => {
    expect(
      await errorsOf(changePasswordSchema, { currentPassword: 'same-pass-1', newPassword: 'same-pass-1' }),
    ).toHaveProperty('newPassword');
  });

  it('refuse an invitation token that is obviously cut short', async () => {
    expect(await errorsOf(acceptInvitationSchema, { token: 'abc', name: 'A', password: '12345678' })).toHaveProperty(
      'token',
    );
  });
});
