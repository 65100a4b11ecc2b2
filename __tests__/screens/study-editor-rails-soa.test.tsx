import { fireEvent, screen, waitFor } from 'expo-router/testing-library';

import { api } from '@/api/client';
import { clearDrafts } from '@/features/study-editor/draft-storage';

import labSupply from '../../examples/lab-supply-two-tap.json';
import { editableStudy } from './support/editor-fixtures';
import { ok, routeApi } from './support/http';
import { renderApp } from './support/render-app';
import { sessionAs } from './support/teamwork-fixtures';

jest.mock('@/api/client', () => ({
  apiBaseUrl: '/api',
  api: { get: jest.fn(), post: jest.fn(), put: jest.fn(), delete: jest.fn() },
}));

const mockedApi = api as unknown as Record<'get' | 'post' | 'put' | 'delete', jest.Mock>;

// The editor mounts every field of the study at once; on a busy machine that takes seconds.
jest.setTimeout(60_000);

type Doc = {
  railPlan?: {
    sources: { id: string; vocV: number }[];
    taps: { name: string; circuit: { kind: string; diodeV?: number; parts?: unknown[]; branches?: { source: string }[] } }[];
    thresholdsV: number[];
    hysteresisV: number;
  };
  devices: { soa?: Record<string, unknown> & { secondBreakdown?: { exponent: number } } }[];
  profile: { segments: Record<string, unknown>[] };
};

/** The lab-supply demo study (rail plan, SOA) as study 21. */
const labStudy = (version = 3) => editableStudy(version, { title: labSupply.title, document: JSON.parse(JSON.stringify(labSupply)) });

async function openEditor(study = labStudy()) {
  const puts: { baseVersion: number; document: Doc }[] = [];
  routeApi(mockedApi, {
    'GET /session': () => ok(sessionAs('designer')),
    'GET /studies/21': () => ok({ study }),
    'PUT /studies/21': (body) => {
      puts.push(body as (typeof puts)[number]);
      return ok({ study: { ...study, version: study.version + 1, document: (body as { document: unknown }).document } });
    },
  });
  renderApp('/studies/21/edit');
  await screen.findByText(`Editing from version ${study.version}`);
  return puts;
}

const openSection = (name: RegExp) => fireEvent.press(screen.getByRole('button', { name }));
const save = () => fireEvent.press(screen.getByRole('button', { name: 'Save' }));

describe('study editor: rail plan and SOA models', () => {
  beforeEach(() => {
    jest.clearAllMocks();
    clearDrafts(21);
  });

  it('edits the sources, a tap’s circuit and the thresholds of the rail plan, stored in SI units', async () => {
    const puts = await openEditor();
    openSection(/^Rail plan/);
    // SI prefixes (BIPM, The International System of Units, 9th ed., Table 7): m = 10⁻³, k = 10³.
    // Both adapters of the parallel tap alike: their spread stays within its 0.1 V mismatch.
    fireEvent.changeText(screen.getByLabelText('A1 open-circuit voltage (V)'), '25.2 V');
    fireEvent.changeText(screen.getByLabelText('A2 open-circuit voltage (V)'), '25.2 V');
    fireEvent.changeText(screen.getByLabelText('Threshold between tap 1 and tap 2 (V)'), '22 V');
    fireEvent.changeText(screen.getByLabelText('Rail plan hysteresis (V)'), '800 mV');
    fireEvent.changeText(screen.getByLabelText('adapters in series diode drop (V)'), '700 mV');
    fireEvent.changeText(screen.getByLabelText('adapters in parallel branch 2 ballast (Ω)'), '50 mΩ');
    // A branch of tap 1 turned from one source into a series node keeps its source, diode and ballast.
    // Circuit kind choices in order: tap 1, its branch 1, its branch 2, tap 2.
    fireEvent.press(screen.getAllByRole('radio', { name: 'In series' })[1]);
    save();

    await waitFor(() => expect(puts).toHaveLength(1));
    const plan = puts[0].document.railPlan!;
    expect(plan.sources[0].vocV).toBeCloseTo(25.2, 12);
    expect(plan.thresholdsV).toEqual([22]);
    expect(plan.hysteresisV).toBeCloseTo(0.8, 12);
    expect(plan.sources[1].vocV).toBeCloseTo(25.2, 12);
    expect(plan.taps[1].circuit.diodeV).toBeCloseTo(0.7, 12);
    expect(plan.taps[0].circuit.branches![0]).toEqual({ kind: 'series', parts: [{ kind: 'source', source: 'A1' }], diodeV: 0.7, ballastOhm: 0.05 });
    expect(plan.taps[0].circuit.branches![1]).toMatchObject({ ballastOhm: expect.closeTo(0.05, 12) });
  });

  it('renames a source in the taps that use it, and adds a tap with a threshold below it', async () => {
    const puts = await openEditor();
    openSection(/^Rail plan/);
    fireEvent.changeText(screen.getByLabelText('Source 2 id'), 'B2');
    save();
    await waitFor(() => expect(puts).toHaveLength(1));
    const plan = puts[0].document.railPlan!;
    expect(plan.sources.map((s) => s.id)).toEqual(['A1', 'B2']);
    expect(JSON.stringify(plan.taps)).not.toContain('"A2"');
    expect(plan.taps[1].circuit.parts).toEqual([
      { kind: 'source', source: 'A1' },
      { kind: 'source', source: 'B2' },
    ]);
    // One threshold fewer than taps (docs/study-format.md, railPlan.thresholdsV).
    fireEvent.press(screen.getByRole('button', { name: 'Add tap' }));
    expect(screen.getByLabelText('Tap 3 name')).toHaveDisplayValue('tap 3');
    expect(screen.getByLabelText('Threshold between tap 2 and tap 3 (V)')).toHaveDisplayValue('');
  });

  it('names the field of a rail-plan value the study parser refuses, and keeps the text typed', async () => {
    await openEditor();
    openSection(/^Rail plan/);
    fireEvent.changeText(screen.getByLabelText('Rail plan hysteresis (V)'), '-1 V');
    // The format's rule for hysteresisV (docs/study-format.md, railPlan: number ≥ 0 V), in the parser's words.
    await waitFor(() => expect(screen.getByTestId('problem-list')).toHaveTextContent(/Rail plan hysteresis: must not be negative, got -1 V/));
    expect(screen.getByTestId('problem-list')).toHaveTextContent(/railPlan\.hysteresisV/);
    expect(screen.getByLabelText('Rail plan hysteresis (V)')).toHaveDisplayValue('-1 V');
    expect(screen.getByLabelText('Rail plan hysteresis (V)')).toHaveProp('aria-invalid', true);
  });

  it('adds a rail plan to a study without one and leaves Vin out of its electrical segments', async () => {
    const puts = await openEditor(editableStudy());
    openSection(/^Rail plan/);
    fireEvent.press(screen.getByRole('button', { name: 'Add rail plan' }));
    expect(await screen.findByLabelText('A1 open-circuit voltage (V)')).toBeVisible();
    fireEvent.changeText(screen.getByLabelText('A1 open-circuit voltage (V)'), '30 V');
    fireEvent.changeText(screen.getByLabelText('A1 source resistance (Ω)'), '0.1');
    fireEvent.changeText(screen.getByLabelText('A1 current rating (A)'), '5 A');
    fireEvent.changeText(screen.getByLabelText('Rail plan hysteresis (V)'), '0.5 V');
    fireEvent.changeText(screen.getByLabelText('Map Iout up to (A)'), '5 A');
    // Nothing left to fill in: the problem list goes away.
    await waitFor(() => expect(screen.queryByTestId('problem-list')).toBeNull());
    save();
    await waitFor(() => expect(puts).toHaveLength(1));
    const doc = puts[0].document;
    expect(doc.railPlan!.sources[0]).toEqual({ id: 'A1', vocV: 30, rsOhm: 0.1, imaxA: 5 });
    expect(doc.profile.segments[1]).not.toHaveProperty('vinV');
    expect(doc.profile.segments[1]).toMatchObject({ voutV: 12, iloadA: 2 });
  });

  it('edits the SOA parameters and second breakdown of a device, with a field named in each error', async () => {
    const puts = await openEditor();
    openSection(/^Pass elements/);
    fireEvent.changeText(screen.getByLabelText('Q1 Ic,max (A)'), '12 A');
    fireEvent.changeText(screen.getByLabelText('Q1 second breakdown exponent'), '1');
    // The SOA core's rule, quoted in the format reference (docs/study-format.md, soa): the exponent must be > 1.
    await waitFor(() => expect(screen.getByTestId('problem-list')).toHaveTextContent(/Q1 second breakdown exponent: must be > 1, got 1/));
    expect(screen.getByLabelText('Q1 second breakdown exponent')).toHaveProp('aria-invalid', true);
    fireEvent.changeText(screen.getByLabelText('Q1 second breakdown exponent'), '2.5');
    fireEvent.changeText(screen.getByLabelText('Q1 second breakdown derating per K'), '0.006');
    await waitFor(() => expect(screen.queryByTestId('problem-list')).toBeNull());
    save();
    await waitFor(() => expect(puts).toHaveLength(1));
    const soa = puts[0].document.devices[0].soa!;
    expect(soa.icMaxA).toBe(12);
    expect(soa.secondBreakdown).toMatchObject({ exponent: 2.5, derating: { kind: 'linear', fractionPerK: 0.006 } });
    expect(soa.notes).toBe(labSupply.devices[0].soa.notes);
  });

  it('shows the SOA check follow an Ic,max edit in the phone’s verdict line', async () => {
    await openEditor();
    const verdict = await screen.findByTestId('live-verdict');
    await waitFor(() => expect(verdict).toHaveTextContent(/SOA check passes for Q1/));
    openSection(/^Pass elements/);
    // Each part of the pair carries up to 1.6 A (the demo's current limit per part), above an Ic,max of 1 A: the horizontal limit of the SOA (docs/study-format.md, soa).
    fireEvent.changeText(screen.getByLabelText('Q1 Ic,max (A)'), '1 A');
    await waitFor(() => expect(screen.getByTestId('live-verdict')).toHaveTextContent(/SOA check fails for Q1/));
  });

  it('gives a device without an SOA a datasheet-points model with a point list', async () => {
    const puts = await openEditor(editableStudy());
    openSection(/^Pass elements/);
    fireEvent.press(screen.getByRole('button', { name: 'Add Q1 SOA from datasheet points' }));
    fireEvent.changeText(await screen.findByLabelText('Q1 curve 1 point 1 Vce (V)'), '1 V');
    fireEvent.changeText(screen.getByLabelText('Q1 curve 1 point 1 Ic (A)'), '10 A');
    fireEvent.press(screen.getByRole('button', { name: 'Add Q1 curve 1 point' }));
    fireEvent.changeText(screen.getByLabelText('Q1 curve 1 point 2 Vce (V)'), '60 V');
    fireEvent.changeText(screen.getByLabelText('Q1 curve 1 point 2 Ic (A)'), '500 mA');
    await waitFor(() => expect(screen.queryByTestId('problem-list')).toBeNull());
    // The boundary chart follows the model as entered (the SOA core reads it: no reason to show instead).
    expect(screen.queryByText(/No boundary chart yet/)).toBeNull();
    save();
    await waitFor(() => expect(puts).toHaveLength(1));
    expect(puts[0].document.devices[0].soa).toEqual({
      kind: 'points',
      transistor: 'bipolar',
      tjMaxC: 150,
      curves: [{ pulseS: 'dc', points: [{ vceV: 1, icA: 10 }, { vceV: 60, icA: 0.5 }] }],
    });
  });
});
