import { nextShutdownState, shutdownWatch } from '@/core/electrical';

// PHYSICS.md §1: output stops at Tj ≥ Tsd and resumes at Tsd − hysteresis.
const spec = { tripC: 165, hysteresisK: 15 };

describe('thermal shutdown state', () => {
  it('trips an output that is on when the junction reaches the trip point', () => {
    expect(nextShutdownState(spec, true, 164.9)).toBe(true);
    expect(nextShutdownState(spec, true, 165)).toBe(false);
  });

  it('keeps a tripped output off inside the hysteresis band and resumes below it', () => {
    expect(nextShutdownState(spec, false, 160)).toBe(false);
    expect(nextShutdownState(spec, false, 150.1)).toBe(false);
    expect(nextShutdownState(spec, false, 150)).toBe(true);
  });

  it('watches the trip level upwards when on and the resume level downwards when off', () => {
    expect(shutdownWatch(spec, true)).toEqual({ levelC: 165, direction: 'up' });
    expect(shutdownWatch(spec, false)).toEqual({ levelC: 150, direction: 'down' });
  });
});
