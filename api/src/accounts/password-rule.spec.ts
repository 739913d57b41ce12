import { validate } from 'class-validator';
import { describe, expect, it } from 'vitest';
import { IsAcceptablePassword, passwordProblem } from './password-rule.js';

describe('password rule', () => {
  it('accepts a long passphrase nobody else uses', () => {
    expect(passwordProblem('tram lines over Harrowby hill')).toBeNull();
    expect(passwordProblem('ÿ'.repeat(3) + 'quota-cell-7!x')).toBeNull();
  });

  it.each([
    ['eleven char', 'at least 12 characters'],
    ['', 'at least 12 characters'],
    [' '.repeat(20), 'must not be only spaces'],
    ['\t \n '.repeat(5), 'must not be only spaces'],
    ['x'.repeat(1025), 'at most 1024 characters'],
  ])('refuses %j: %s', (password, message) => {
    expect(passwordProblem(password)).toContain(message);
  });

  it('counts characters, not UTF-16 units: 11 emoji are too short', () => {
    expect(passwordProblem('🙂'.repeat(11))).toContain('at least 12 characters');
  });

  // Entries of @zxcvbn-ts/language-common 4.1's passwords-common list at least 12 long.
  it.each(['qwerty123456', '1q2w3e4r5t6y', '123qweasdzxc', 'QWERTY123456'])('refuses the common password %s', (password) => {
    expect(passwordProblem(password)).toContain('too common');
  });

  it('refuses repetitions of a short unit or of a common password', () => {
    expect(passwordProblem('abcabcabcabc')).toContain('too common');
    expect(passwordProblem('aaaaaaaaaaaaaaaa')).toContain('too common');
    expect(passwordProblem('passwordpassword')).toContain('too common');
  });

  it('gives its message through the DTO decorator', async () => {
    class Body {
      @IsAcceptablePassword()
      password!: string;
    }
    const body = Object.assign(new Body(), { password: 'qwerty123456' });
    const [error] = await validate(body);
    expect(error?.constraints?.isAcceptablePassword).toContain('too common');
    expect(await validate(Object.assign(new Body(), { password: 'a fine long passphrase' }))).toEqual([]);
  });
});
