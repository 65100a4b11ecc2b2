import { act, renderHook } from '@testing-library/react-native';
import { setIn } from 'formik';

import type { FieldMeta } from '@/features/study-editor/editor-context';
import { valuesFromStudy } from '@/features/study-editor/editor-values';
import type { EditorValues } from '@/features/study-editor/types';
import { CHECK_DELAY_MS, INLINE_CHECK_MS, useEditorCheck, type EditorCheckState } from '@/features/study-editor/use-editor-check';

import { editableStudy } from './support/editor-fixtures';

const FIELD = 'document.devices[0].tjMaxC';

/**
 * A junction limit below absolute zero (−273.15 °C, the zero of the kelvin scale: SI Brochure,
 * from memory) is one the study parser must refuse, naming the field.
 */
const withTjMax = (values: EditorValues, tjMaxC: number): EditorValues => setIn(values, FIELD, tjMaxC);

function renderCheck() {
  const base = valuesFromStudy(editableStudy());
  const fields = { current: new Map<string, FieldMeta>() };
  const hook = renderHook<EditorCheckState, { values: EditorValues }>(({ values }) => useEditorCheck(values, fields, base), { initialProps: { values: base } });
  return { base, ...hook };
}

const problemAt = (state: EditorCheckState) => state.problems.find((p) => p.field === FIELD);

describe('the editor check', () => {
  beforeEach(() => jest.useFakeTimers());
  afterEach(() => jest.useRealTimers());

  it('checks an edit made after a pause at once, without waiting for the typing delay', async () => {
    const { base, result, rerender } = renderCheck();
    await act(async () => jest.advanceTimersByTime(2 * CHECK_DELAY_MS));
    expect(result.current.problems).toEqual([]);
    const good = result.current.parsed;
    expect(good).not.toBeNull();

    await act(async () => jest.advanceTimersByTime(2 * CHECK_DELAY_MS));
    rerender({ values: withTjMax(base, -300) });
    // The next task, not CHECK_DELAY_MS later.
    await act(async () => jest.advanceTimersByTime(0));
    expect(problemAt(result.current)?.reason).toBeDefined();
    expect(result.current.parsed).toBeNull();
    // The last document without problems stays for the results.
    expect(result.current.lastGood).toBe(good);
  });

  it('checks a burst of edits once, when it pauses', async () => {
    const { base, result, rerender } = renderCheck();
    await act(async () => jest.advanceTimersByTime(2 * CHECK_DELAY_MS));
    rerender({ values: withTjMax(base, 140) });
    await act(async () => jest.advanceTimersByTime(0));
    const first = result.current.parsed;
    expect(first?.document.devices[0].tjMaxC).toBe(140);
    // Keystrokes closer together than CHECK_DELAY_MS: nothing is checked until they stop.
    for (const tj of [-300, 130, 120]) {
      await act(async () => jest.advanceTimersByTime(CHECK_DELAY_MS / 4));
      rerender({ values: withTjMax(base, tj) });
    }
    await act(async () => jest.advanceTimersByTime(CHECK_DELAY_MS - 1));
    expect(result.current.parsed).toBe(first);
    await act(async () => jest.advanceTimersByTime(1));
    expect(result.current.parsed?.document.devices[0].tjMaxC).toBe(120);
    expect(problemAt(result.current)).toBeUndefined();
  });

  it('runs a quick check in the edit’s own commit, and a slow one in the next task so the edit paints first', async () => {
    const { base, result, rerender } = renderCheck();
    // The first check runs in a task of its own and is timed (fake timers: it takes no time).
    await act(async () => jest.advanceTimersByTime(2 * CHECK_DELAY_MS));
    rerender({ values: withTjMax(base, 140) });
    expect(result.current.parsed?.document.devices[0].tjMaxC).toBe(140);

    // Checks that take longer than INLINE_CHECK_MS: the next edit's check waits for the next task.
    const clock = jest.spyOn(performance, 'now');
    let t = 1e6;
    clock.mockImplementation(() => (t += INLINE_CHECK_MS + 1));
    await act(async () => jest.advanceTimersByTime(2 * CHECK_DELAY_MS));
    rerender({ values: withTjMax(base, 130) });
    expect(result.current.parsed?.document.devices[0].tjMaxC).toBe(130); // this check was timed slow
    t += 10 * CHECK_DELAY_MS; // a pause before the next edit
    rerender({ values: withTjMax(base, 120) });
    expect(result.current.parsed?.document.devices[0].tjMaxC).toBe(130);
    await act(async () => jest.advanceTimersByTime(0));
    expect(result.current.parsed?.document.devices[0].tjMaxC).toBe(120);
    clock.mockRestore();
  });
});
