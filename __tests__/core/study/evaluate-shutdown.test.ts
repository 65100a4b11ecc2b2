import { evaluateStudy, parseStudy, type StudyEvent } from '@/core/study';
import { assertInDelta } from '../../helpers/assert-in-delta';
import { singleRcStudy } from './study-fixtures';

// Single RC: R = 1.5 + 0.5 + 3.5 = 5.5 K/W, C = 2 J/K, τ = 11 s; trip 165 °C, resume 150 °C.
const R = 5.5;
const TAU = 11;
const TA = 25;
const TRIP = 165;
const RESUME = 150;

function study(iqA: number, durationS: number) {
  return parseStudy(
    singleRcStudy({
      rjc: 1.5,
      rcs: 0.5,
      rsa: 3.5,
      c: 2,
      ta: TA,
      segments: [{ durationS, vinV: 12, voutV: 5, iloadA: 4 }],
      electrical: { iqA, thermalShutdown: { tripC: TRIP, hysteresisK: TRIP - RESUME } },
    }),
  );
}

describe('evaluateStudy thermal shutdown of a single RC', () => {
  it.each([0, 0.05])('cycles with on and off times τ ln(…) of the hysteresis band (Iq = %s A)', (iqA) => {
    // First-order response (textbook) between the band edges: heating towards Ta + Pon·R,
    // cooling towards Ta + Poff·R, where Poff = Vin·Iq (the part draws Iq in shutdown).
    const pOn = (12 - 5) * 4 + 12 * iqA;
    const pOff = 12 * iqA;
    const highOn = TA + pOn * R;
    const lowOff = TA + pOff * R;
    const firstTrip = TAU * Math.log((highOn - TA) / (highOn - TRIP));
    const onTime = TAU * Math.log((highOn - RESUME) / (highOn - TRIP));
    const offTime = TAU * Math.log((TRIP - lowOff) / (RESUME - lowOff));

    const r = evaluateStudy(study(iqA, 200));
    const events = r.events as Extract<StudyEvent, { kind: 'shutdown' | 'resume' }>[];
    expect(events.length).toBeGreaterThan(10);
    assertInDelta(events[0].timeS, firstTrip, 1e-9, 'first trip');
    for (let k = 1; k < events.length; k++) {
      const gap = events[k].timeS - events[k - 1].timeS;
      expect(events[k].kind).toBe(events[k - 1].kind === 'shutdown' ? 'resume' : 'shutdown');
      assertInDelta(gap, events[k].kind === 'resume' ? offTime : onTime, 1e-8, `interval ${k}`);
      assertInDelta(events[k].junctionC, events[k].kind === 'resume' ? RESUME : TRIP, 1e-9, `level at event ${k}`);
    }
    // The junction never passes the trip point; it reaches it exactly.
    assertInDelta(r.devices.U1.peakJunctionC, TRIP, 1e-9, 'peak');
    expect(r.devices.U1.shutdowns).toBe(r.eventCounts.shutdown);
    expect(r.solver.method).toBe('event-driven');
  });
});
