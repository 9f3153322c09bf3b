/**
 * Password hashing with node:crypto scrypt: a random salt per password, the cost stored with the
 * hash (so it can be raised later), and a timing-safe comparison.
 */
import { randomBytes, scrypt, timingSafeEqual, type ScryptOptions } from 'node:crypto';

const KEY_LENGTH = 64;

function derive(password: string, salt: Buffer, N: number): Promise<Buffer> {
  const options: ScryptOptions = { N, r: 8, p: 1, maxmem: 256 * N * 8 + 1024 * 1024 };
  return new Promise((resolve, reject) => {
    scrypt(password.normalize('NFKC'), salt, KEY_LENGTH, options, (err, key) =>
      err ? reject(err) : resolve(key),
    );
  });
}

/** "scrypt$N$salt$hash" with base64url parts. */
export async function hashPassword(password: string, N: number): Promise<string> {
  const salt = randomBytes(16);
  const key = await derive(password, salt, N);
  return `scrypt$${N}$${salt.toString('base64url')}$${key.toString('base64url')}`;
}

export async function verifyPassword(password: string, stored: string): Promise<boolean> {
  const [scheme, nText, saltText, keyText] = stored.split('$');
  const N = Number(nText);
  if (scheme !== 'scrypt' || !Number.isInteger(N) || N < 2 || !saltText || !keyText) return false;
  const expected = Buffer.from(keyText, 'base64url');
  const actual = await derive(password, Buffer.from(saltText, 'base64url'), N);
  return expected.length === actual.length && timingSafeEqual(expected, actual);
}

/**
 * A hash of a random password, compared against when the e-mail is unknown, so a failed sign-in
 * takes about as long whether or not the account exists.
 */
export async function decoyHash(N: number): Promise<string> {
  return hashPassword(randomBytes(12).toString('hex'), N);
}
