/**
 * Password hashing with node:crypto scrypt: a random salt per password, the cost stored with the
 * hash (so it can be raised later), and a timing-safe comparison; and the strength rule for new
 * passwords.
 */
import { randomBytes, scrypt, timingSafeEqual, type ScryptOptions } from 'node:crypto';
import { ZxcvbnFactory } from '@zxcvbn-ts/core';
import { adjacencyGraphs, dictionary } from '@zxcvbn-ts/language-common';

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

// ---- strength -----------------------------------------------------------------------------------

/** Fewer characters than this is refused before any estimate (NIST SP 800-63B asks for at least 8). */
export const PASSWORD_MIN_LENGTH = 10;
/** zxcvbn score (0-4) a new password must reach: 3 is "safely unguessable" in its own words. */
export const PASSWORD_MIN_SCORE = 3;

let estimator: ZxcvbnFactory | null = null;

/**
 * Why a new password is refused, or null when it may be used: too short, or too easy to guess by
 * the zxcvbn estimate with the common-password and keyboard lists of @zxcvbn-ts/language-common
 * (repeats such as "aaaaaaaaaa" or ten spaces, sequences such as "1234567890", common passwords),
 * also counting the person's own e-mail and name and the product's name as known words.
 */
export function passwordProblem(password: string, known: readonly string[] = []): string | null {
  if ([...password].length < PASSWORD_MIN_LENGTH) return `must be at least ${PASSWORD_MIN_LENGTH} characters`;
  estimator ??= new ZxcvbnFactory({ dictionary: { ...dictionary }, graphs: adjacencyGraphs });
  const inputs = [
    'reachline',
    ...known.flatMap((k) =>
      k
        .toLowerCase()
        .split(/[^a-z0-9]+/)
        .filter(Boolean),
    ),
  ];
  const { score } = estimator.check(password.slice(0, 100), inputs);
  if (score < PASSWORD_MIN_SCORE)
    return 'is too easy to guess (a repeat, a sequence, a common password or your own name); use a longer phrase of unrelated words';
  return null;
}
