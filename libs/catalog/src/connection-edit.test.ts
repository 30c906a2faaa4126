import { describe, expect, it } from 'vitest';
import { changeConnection } from './connection-edit.js';

describe('changeConnection', () => {
  it('keeps the size where the new family has it, else takes its first size', () => {
    expect(changeConnection({ family: 'flare37', size: '-6', gender: 'male' }, { family: 'orb' })).toEqual({ family: 'orb', size: '-6', gender: 'male' });
    expect(changeConnection({ family: 'flare37', size: '-6', gender: 'male' }, { family: 'npt' }).size).toBe('1/16');
  });
  it('gives a seat-form family its usual seat and drops a seat on families without them', () => {
    expect(changeConnection({ family: 'flare37', size: '-6', gender: 'female' }, { family: 'metric' })).toMatchObject({ family: 'metric', seat: 'o-ring', size: 'M8x1' });
    expect(changeConnection({ family: 'metric', size: 'M14x1.5', gender: 'female', seat: 'o-ring' }, { family: 'banjo' })).toEqual({ family: 'banjo', size: 'M14x1.5', gender: 'female' });
  });
  it('a seat form a size is not made in moves the size (M24x1.5 is a 24° cone S size, not ISO 6149-1)', () => {
    expect(changeConnection({ family: 'metric', size: 'M24x1.5', gender: 'male', seat: 'cone24-s' }, { seat: 'o-ring' }).size).toBe('M8x1');
    expect(changeConnection({ family: 'metric', size: 'M14x1.5', gender: 'male', seat: 'o-ring' }, { seat: 'sealing-edge' }).size).toBe('M14x1.5');
  });
});
