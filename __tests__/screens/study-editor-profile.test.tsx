import { fireEvent, screen, waitFor, within } from 'expo-router/testing-library';

import { api } from '@/api/client';
import { clearDrafts } from '@/features/study-editor/draft-storage';

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
jest.setTimeout(20_000);

async function openProfile() {
  routeApi(mockedApi, {
    'GET /session': () => ok(sessionAs('designer')),
    'GET /studies/21': () => ok({ study: editableStudy() }),
  });
  renderApp('/studies/21/edit');
  await screen.findByText('Editing from version 3');
  fireEvent.press(screen.getByRole('button', { name: /^Load profile/ }));
}

const label = (n: string) => screen.getByLabelText(`Segment ${n} label`).props.value as string;
const summary = () => screen.getByTestId('profile-summary');

describe('load profile editor', () => {
  beforeEach(() => {
    jest.clearAllMocks();
    clearDrafts(21);
  });

  it('adds, duplicates, moves and deletes segments in the table', async () => {
    await openProfile();
    // The format reference's example: 2 + 10 × 2 = 22 segments, 10 + 5 + 10 × (0.5 + 1.5) = 35 s.
    expect(summary()).toHaveTextContent('22 segments per pass, one pass 35 s, 2 passes');

    fireEvent.press(screen.getByRole('button', { name: 'Duplicate segment 1' }));
    expect([label('1'), label('2'), label('3')]).toEqual(['warm-up', 'warm-up', 'load']);
    expect(summary()).toHaveTextContent(/^23 segments per pass, one pass 45 s/);

    fireEvent.changeText(screen.getByLabelText('Segment 2 label'), 'soak');
    fireEvent.press(screen.getByRole('button', { name: 'Move segment 2 down' }));
    expect([label('1'), label('2'), label('3')]).toEqual(['warm-up', 'load', 'soak']);
    fireEvent.press(screen.getByRole('button', { name: 'Move segment 3 up' }));
    expect([label('1'), label('2'), label('3')]).toEqual(['warm-up', 'soak', 'load']);
    expect(screen.getByRole('button', { name: 'Move segment 1 up' })).toBeDisabled();

    fireEvent.press(screen.getByRole('button', { name: 'Delete segment 1' }));
    expect([label('1'), label('2')]).toEqual(['soak', 'load']);
    expect(summary()).toHaveTextContent(/^22 segments per pass, one pass 35 s/);

    // A new segment takes the kind of the last one and waits for its values.
    fireEvent.press(screen.getByRole('button', { name: 'Add segment' }));
    expect(screen.getByLabelText('Segment 4 duration (s)')).toHaveDisplayValue('');
    expect(screen.getByLabelText('Segment 4 Iload (A)')).toBeVisible();
    await waitFor(() => expect(screen.getByTestId('problem-list')).toHaveTextContent(/Segment 4 duration: is empty/));
  });

  it('appends a pulse train as one repeated group of an on and an off segment', async () => {
    await openProfile();
    fireEvent.press(screen.getByRole('button', { name: 'Pulse train' }));
    const helper = screen.getByTestId('pulse-train');
    // Vin and Vout are held from the last operating point of the profile.
    expect(within(helper).getByLabelText('Vin held (V)')).toHaveDisplayValue('24 V');
    fireEvent.changeText(within(helper).getByLabelText('On level (A)'), '2.5');
    fireEvent.changeText(within(helper).getByLabelText('Off level (A)'), '200 mA');
    fireEvent.changeText(within(helper).getByLabelText('On for (s)'), '200 ms');
    fireEvent.changeText(within(helper).getByLabelText('Off for (s)'), '0.8');
    fireEvent.changeText(within(helper).getByLabelText('Pulses'), '25');
    fireEvent.press(within(helper).getByRole('button', { name: 'Append pulse train' }));

    // 25 pulses of (0.2 + 0.8) s add 50 segments and 25 s to the 22 segments and 35 s of one pass.
    await waitFor(() => expect(summary()).toHaveTextContent(/^72 segments per pass, one pass 60 s/));
    const group = screen.getByTestId('group-4');
    expect(within(group).getByLabelText('Group 4 repeat')).toHaveDisplayValue('25');
    expect(within(group).getByLabelText('Segment 4.1 duration (s)')).toHaveDisplayValue('200 ms');
    expect(within(group).getByLabelText('Segment 4.1 Iload (A)')).toHaveDisplayValue('2.5 A');
    expect(within(group).getByLabelText('Segment 4.2 duration (s)')).toHaveDisplayValue('800 ms');
    expect(within(group).getByLabelText('Segment 4.2 Iload (A)')).toHaveDisplayValue('200 mA');
    expect(within(group).queryByLabelText('Segment 4.3 duration (s)')).toBeNull();
  });

  it('appends a ramp as equal steps, each at the ramp’s mean over its step', async () => {
    await openProfile();
    fireEvent.press(screen.getByRole('button', { name: 'Ramp' }));
    const helper = screen.getByTestId('ramp');
    fireEvent.changeText(within(helper).getByLabelText('From (A)'), '0');
    fireEvent.changeText(within(helper).getByLabelText('To (A)'), '8 A');
    fireEvent.changeText(within(helper).getByLabelText('Over (s)'), '4 s');
    fireEvent.changeText(within(helper).getByLabelText('Steps'), '4');
    fireEvent.press(within(helper).getByRole('button', { name: 'Append ramp' }));

    // The mean of a straight ramp over each quarter of 0 → 8 A: 1, 3, 5 and 7 A, 1 s each (arithmetic).
    await waitFor(() => expect(summary()).toHaveTextContent(/^26 segments per pass, one pass 39 s/));
    expect([4, 5, 6, 7].map((n) => screen.getByLabelText(`Segment ${n} Iload (A)`).props.value)).toEqual(['1 A', '3 A', '5 A', '7 A']);
    expect(screen.getByLabelText('Segment 7 duration (s)')).toHaveDisplayValue('1 s');
    expect(screen.getByLabelText('Segment 7 Vin (V)')).toHaveDisplayValue('24 V');
  });

  it('says why a pulse train cannot be appended', async () => {
    await openProfile();
    fireEvent.press(screen.getByRole('button', { name: 'Pulse train' }));
    const helper = screen.getByTestId('pulse-train');
    fireEvent.changeText(within(helper).getByLabelText('On level (A)'), '2 A');
    fireEvent.changeText(within(helper).getByLabelText('On for (s)'), '0');
    fireEvent.changeText(within(helper).getByLabelText('Off for (s)'), '1 s');
    fireEvent.changeText(within(helper).getByLabelText('Pulses'), '2.5');
    fireEvent.press(within(helper).getByRole('button', { name: 'Append pulse train' }));
    expect(await within(helper).findByText('must be greater than 0')).toBeVisible();
    expect(within(helper).getByText('must be a whole number, got 2.5')).toBeVisible();
    expect(summary()).toHaveTextContent(/^22 segments per pass/);
  });

  it('turns the rows of a CSV log into segments, each lasting until the next row’s time', async () => {
    await openProfile();
    fireEvent.press(screen.getByRole('button', { name: 'Import CSV log' }));
    const helper = screen.getByTestId('csv-import');
    // Invented log: current in mA by its column name; equal neighbouring rows join into one segment.
    fireEvent.changeText(within(helper).getByLabelText('CSV text'), 'time_s,vin_v,current_ma\n0,24,500\n2,24,1500\n5,24,1500\n6,24,0\n');
    expect(within(helper).getByTestId('csv-preview')).toHaveTextContent(/time_s.*vin_v.*current_ma/);
    expect(within(helper).getByLabelText('Load current: unit of bare numbers')).toHaveDisplayValue('mA');
    // No column is named like an output voltage, so Vout starts as a fixed value.
    fireEvent.changeText(within(helper).getByLabelText('Vout, every row (V)'), '12 V');
    expect(within(helper).getByTestId('csv-result')).toHaveTextContent('4 rows give 2 segments over 6 s.');
    fireEvent.press(within(helper).getByRole('button', { name: 'Replace all segments' }));

    await waitFor(() => expect(summary()).toHaveTextContent(/^2 segments per pass, one pass 6 s/));
    expect(screen.getByLabelText('Segment 1 duration (s)')).toHaveDisplayValue('2 s');
    expect(screen.getByLabelText('Segment 1 Iload (A)')).toHaveDisplayValue('500 mA');
    expect(screen.getByLabelText('Segment 1 Vin (V)')).toHaveDisplayValue('24 V');
    expect(screen.getByLabelText('Segment 2 duration (s)')).toHaveDisplayValue('4 s');
    expect(screen.getByLabelText('Segment 2 Iload (A)')).toHaveDisplayValue('1.5 A');
    expect(screen.getByLabelText('Segment 2 Vout (V)')).toHaveDisplayValue('12 V');
    expect(screen.queryByLabelText('Segment 3 duration (s)')).toBeNull();
  });

  it('names the line and column of a log value that does not read', async () => {
    await openProfile();
    fireEvent.press(screen.getByRole('button', { name: 'Import CSV log' }));
    const helper = screen.getByTestId('csv-import');
    fireEvent.changeText(within(helper).getByLabelText('CSV text'), 'time_s,current_a\n0,1\n1,two\n1,3\n');
    expect(within(helper).getAllByText('is empty')).toHaveLength(2);
    fireEvent.changeText(within(helper).getByLabelText('Vin, every row (V)'), '24');
    fireEvent.changeText(within(helper).getByLabelText('Vout, every row (V)'), '5');
    expect(within(helper).getByText('Line 3, current_a: "two" is not a number')).toBeVisible();
    expect(within(helper).getByText('Line 4, time_s: time must be after the previous row’s (1 s)')).toBeVisible();
  });
});
