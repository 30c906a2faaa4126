import { hashPassword, passwordSchema, verifyPassword } from './password.js';

describe('password hashing', () => {
  it('uses argon2id with at least the OWASP minimum cost (m=19 MiB, t=2, p=1)', async () => {
    // OWASP Password Storage Cheat Sheet, "Argon2id": m=19456 (19 MiB), t=2, p=1 as the minimum.
    // The PHC string format (RFC 9106 section 4 / PHC string format spec) carries the parameters.
    const phc = await hashPassword('linesmith-demo');
    const match = /^\$argon2id\$v=19\$m=(\d+),t=(\d+),p=(\d+)\$/.exec(phc);
    expect(match).not.toBeNull();
    const [, memory, time, lanes] = match!.map(Number);
    expect(memory).toBeGreaterThanOrEqual(19456);
    expect(time).toBeGreaterThanOrEqual(2);
    expect(lanes).toBeGreaterThanOrEqual(1);
  });

  it('salts each hash and verifies only the right password', async () => {
    const [a, b] = await Promise.all([hashPassword('same-password'), hashPassword('same-password')]);
    expect(a).not.toBe(b);
    await expect(verifyPassword(a, 'same-password')).resolves.toBe(true);
    await expect(verifyPassword(a, 'Same-password')).resolves.toBe(false);
    await expect(verifyPassword('not-a-phc-string', 'same-password')).resolves.toBe(false);
  });

  it('asks for at least 10 characters', () => {
    expect(passwordSchema.safeParse('123456789').success).toBe(false);
    expect(passwordSchema.safeParse('linesmith-demo').success).toBe(true);
  });

  it.each([
    // Ten characters or more, yet on the common-password lists or trivially patterned
    // (OWASP Authentication Cheat Sheet, "Password Complexity": block common and breached passwords).
    ['ten spaces', '          '],
    ['a common password', 'password123'],
    ['a keyboard row', 'qwertyuiop'],
    ['a digit run', '1234567890'],
    ['one repeated letter', 'aaaaaaaaaa'],
    ['an alphabet run', 'abcdefghij'],
    ['a common word with digits and a symbol', 'Password1!'],
  ])('refuses %s', (_label, password) => {
    const result = passwordSchema.safeParse(password);
    expect(result.success).toBe(false);
    expect(result.error?.issues[0]?.message).toMatch(/only spaces|too common or too easy/);
  });

  it('accepts unrelated words', () => {
    expect(passwordSchema.safeParse('correct-horse-battery').success).toBe(true);
    expect(passwordSchema.safeParse('gasket lantern ferry').success).toBe(true);
  });
});
