// resolveInside / checkInside: the workspace confinement shared by the config and the action.
import { mkdirSync, mkdtempSync, realpathSync, rmSync, symlinkSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, test } from 'vitest';
import { checkInside, isInside, resolveInside } from '../../src/common/paths.js';
import { UserError } from '../../src/common/errors.js';

const root = realpathSync(mkdtempSync(join(tmpdir(), 'neuron-budget-paths-')));
const outside = realpathSync(mkdtempSync(join(tmpdir(), 'neuron-budget-paths-out-')));
mkdirSync(join(root, 'ci'));
symlinkSync(outside, join(root, 'out-link'));
symlinkSync(join(root, 'ci'), join(root, 'in-link'));
afterAll(() => {
  rmSync(root, { recursive: true, force: true });
  rmSync(outside, { recursive: true, force: true });
});

describe('isInside', () => {
  test.each([
    ['/a/b', '/a/b', true],
    ['/a/b', '/a/b/c', true],
    ['/a/b', '/a/bc', false],
    ['/a/b', '/a', false],
    ['/a/b', '/a/b/../c', false],
  ])('%s contains %s: %s', (parent, child, expected) => {
    expect(isInside(parent, join(child))).toBe(expected);
  });
});

describe('resolveInside', () => {
  test.each([
    ['data.csv', 'ci', join(root, 'ci', 'data.csv')],
    ['../data.csv', 'ci', join(root, 'data.csv')],
    ['./a/../b.csv', '', join(root, 'b.csv')],
    ['in-link/file.csv', '', join(root, 'in-link', 'file.csv')],
    ['.', '', root],
  ])('%s from %s stays inside', (p, base, expected) => {
    expect(resolveInside(root, join(root, base), p)).toBe(expected);
  });

  test('an absolute path inside the workspace is allowed', () => {
    expect(resolveInside(root, root, join(root, 'ci', 'x.csv'))).toBe(join(root, 'ci', 'x.csv'));
  });

  test.each([
    ['../data.csv', '', 'leads outside'],
    ['../../data.csv', 'ci', 'leads outside'],
    ['/etc/passwd', '', 'absolute path outside'],
    ['out-link/data.csv', '', 'symbolic link'],
    ['out-link', '', 'symbolic link'],
    ['', '', 'empty'],
    ['a\0b', '', 'NUL'],
  ])('%s from %s is refused (%s)', (p, base, reason) => {
    const result = checkInside(root, join(root, base), p);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.reason).toContain(reason);
  });

  test('the error carries the key it was given', () => {
    try {
      resolveInside(root, root, '../x', 'working-directory');
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(UserError);
      expect((error as UserError).key).toBe('working-directory');
      expect((error as UserError).message).toMatch(/^working-directory: "\.\.\/x" leads outside the workspace/);
    }
  });
});
