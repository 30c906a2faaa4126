import { hashRefreshToken } from './refresh-tokens.service.js';

describe('hashRefreshToken', () => {
  it('is SHA-256 (FIPS 180-2 appendix B.1 example "abc")', () => {
    expect(hashRefreshToken('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
  });

  it('is SHA-256 (FIPS 180-2 appendix B.2 two-block example)', () => {
    expect(hashRefreshToken('abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq')).toBe(
      '248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1',
    );
  });
});
