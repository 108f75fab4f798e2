import { describe, expect, it } from 'vitest';
import { joinNegativeValues } from '../../src/cli/negativeValues.js';
import { runCli } from '../helpers/cli.js';

describe('joinNegativeValues', () => {
  it('joins a negative quantity to the option before it', () => {
    expect(joinNegativeValues(['state', '-p', '-0.5 barg', '--x', '1'], new Set())).toEqual(['state', '-p=-0.5 barg', '--x', '1']);
    expect(joinNegativeValues(['state', '--T', '-.5 degC'], new Set())).toEqual(['state', '--T=-.5 degC']);
  });
  it('leaves options, flags and words alone', () => {
    expect(joinNegativeValues(['solve', 'a.yaml', '--json', '-1'], new Set(['json']))).toEqual(['solve', 'a.yaml', '--json', '-1']);
    expect(joinNegativeValues(['state', '-p', '2 barg', '-x', '1'], new Set())).toEqual(['state', '-p', '2 barg', '-x', '1']);
  });
});

describe('steamwright state with a negative gauge pressure', () => {
  it('-p "-0.5 barg" is half a bar below the atmosphere (README, state)', async () => {
    const run = await runCli(['state', '-p', '-0.5 barg', '--x', '1', '--json']);
    expect(run.stderr).toBe('');
    expect(run.code).toBe(0);
    expect(JSON.parse(run.stdout).p_MPa).toBeCloseTo(0.051325, 9);
  });
});
