import { screen, within } from 'expo-router/testing-library';

import { api } from '@/api/client';
import type { Review } from '@/features/review/types';
import type { StudyComment } from '@/features/comments/types';

import { ok, routeApi } from './support/http';
import { renderApp } from './support/render-app';
import { PEOPLE, sessionAs, studyAt } from './support/teamwork-fixtures';

jest.mock('@/api/client', () => ({
  apiBaseUrl: '/api',
  api: { get: jest.fn(), post: jest.fn(), delete: jest.fn() },
}));
// The report as on a wide window: its inputs in rows and columns.
jest.mock('@/components/ui/use-is-wide', () => ({ useIsWide: jest.fn(() => true) }));

const mockedApi = api as unknown as Record<'get' | 'post' | 'delete', jest.Mock>;

/**
 * The "Full example" of the study format reference (docs/study-format.md), with the pulse
 * group repeated 20 times so the segment table is long enough to be cut.
 */
const DOCUMENT = {
  format: 'junctura-study',
  version: 1,
  title: 'Pass transistor on a small sink (demo data)',
  description: 'Demo data: invented values.',
  marginK: 20,
  ambient: { temperatureC: 40 },
  enclosure: { rthKPerW: 2.5, capacityJPerK: 150 },
  sinks: [{ id: 'S1', rthKPerW: 1.1, massKg: 0.2, material: 'aluminium', naturalConvection: { referenceRiseK: 50, exponent: 0.25 } }],
  devices: [
    {
      id: 'Q1',
      name: 'pass transistor',
      tjMaxC: 150,
      sink: 'S1',
      count: 1,
      package: { kind: 'foster', terms: [{ rKPerW: 0.2, tauS: 0.001 }, { rKPerW: 0.5, tauS: 0.05 }] },
      interface: { rthKPerW: 0.3, material: 'silicone pad' },
    },
  ],
  profile: {
    segments: [
      { label: 'warm-up', durationS: 10, powerW: { Q1: 20 } },
      { label: 'load', durationS: 5, vinV: 24, voutV: 12, iloadA: 2 },
      {
        label: 'pulses',
        repeat: 20,
        segments: [
          { durationS: 0.5, vinV: 24, voutV: 12, iloadA: 3 },
          { durationS: 1.5, vinV: 24, voutV: 12, iloadA: 0.2 },
        ],
      },
    ],
    repeat: 2,
  },
};

const APPROVED_AT = '2025-05-02T14:30:00.000Z';

const REVIEWS: Review[] = [
  { id: 1, revision: 1, decision: 'changes_requested', comment: 'Use the 40 °C enclosure ambient.', reviewer: PEOPLE.reviewer, createdAt: '2025-05-01T11:00:00.000Z' },
  { id: 2, revision: 2, decision: 'approved', comment: '', reviewer: { id: PEOPLE.reviewer.id, name: PEOPLE.reviewer.name }, createdAt: APPROVED_AT },
];

const COMMENTS: StudyComment[] = [
  {
    id: 5,
    body: 'The sink is close to its limit at the end of the pulses.',
    anchor: { kind: 'time', timeS: 38 },
    revision: 2,
    author: { id: PEOPLE.reviewer.id, name: PEOPLE.reviewer.name },
    createdAt: '2025-05-02T14:00:00.000Z',
  },
];

// The reference for dates is the platform's own Intl formatter, in the app's documented style ("2 May 2025, 14:30").
const dateTime = (iso: string) =>
  new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' }).format(Date.parse(iso));

function openReport(study: ReturnType<typeof studyAt>, reviews: Review[] = REVIEWS) {
  routeApi(mockedApi, {
    'GET /session': () => ok(sessionAs('reviewer')),
    'GET /studies/21': () => ok({ study }),
    'GET /studies/21/reviews': () => ok({ reviews }),
    'GET /studies/21/comments': () => ok({ comments: COMMENTS }),
  });
  renderApp('/studies/21/report');
}

describe('study report', () => {
  beforeEach(() => jest.clearAllMocks());

  it('names the approved revision, its reviewer and date, and marks a newer draft as not approved', async () => {
    openReport(studyAt('draft', 3, { document: DOCUMENT }));

    const approval = await screen.findByTestId('report-approval');
    expect(await within(approval).findByText(`Revision 2 approved by ${PEOPLE.reviewer.name} on ${dateTime(APPROVED_AT)}`)).toBeVisible();
    expect(within(approval).getByTestId('report-not-approved')).toHaveTextContent(
      'Not approved: Revision 3, shown in this report, is not the approved revision: it is draft, saved after revision 2 was approved.',
    );
    const decisions = screen.getByLabelText('Review decisions');
    expect(within(decisions).getByText('changes requested')).toBeVisible();
    expect(within(decisions).getByText('Use the 40 °C enclosure ambient.')).toBeVisible();
  });

  it('shows the approved revision without a warning when it is the one in the report', async () => {
    const study = studyAt('approved', 2, {
      document: DOCUMENT,
      approval: { revision: 2, reviewer: { id: PEOPLE.reviewer.id, name: PEOPLE.reviewer.name }, at: APPROVED_AT },
    });
    openReport(study);

    const approval = await screen.findByTestId('report-approval');
    expect(within(approval).getByText(`Revision 2 approved by ${PEOPLE.reviewer.name} on ${dateTime(APPROVED_AT)}`)).toBeVisible();
    expect(within(approval).getByText('This report shows the approved revision.')).toBeVisible();
    expect(within(approval).queryByTestId('report-not-approved')).toBeNull();
  });

  it('says so when no revision has been approved', async () => {
    openReport(studyAt('in_review', 1, { document: DOCUMENT }), []);

    const approval = await screen.findByTestId('report-approval');
    expect(await within(approval).findByText('No revision of this study has been approved.')).toBeVisible();
    expect(within(approval).getByTestId('report-not-approved')).toHaveTextContent('Not approved: Revision 1, shown in this report, is not approved (in review).');
  });

  it('lists the inputs in tables, cuts the long segment table with a count, and gives the cautions and comments', async () => {
    openReport(studyAt('draft', 3, { document: DOCUMENT }));
    await screen.findByTestId('report-header');

    const inputs = screen.getByTestId('report-section-inputs');
    const devices = within(inputs).getByLabelText('Pass devices');
    expect(within(devices).getByText('pass transistor')).toBeVisible();
    expect(within(devices).getByText('150 °C')).toBeVisible();
    // Foster terms in series: Rθjc = 0.2 + 0.5 = 0.7 K/W (the Foster form of Zth, PHYSICS.md §3, as t → ∞).
    const packages = within(inputs).getByLabelText('Package models and interfaces');
    expect(within(packages).getByText('Foster, 2 terms, Rθjc 0.7 K/W')).toBeVisible();
    expect(within(packages).getByText('0.2 K/W, τ 1 ms; 0.5 K/W, τ 50 ms')).toBeVisible();
    expect(within(packages).getByText('Rθcs 0.3 K/W, silicone pad')).toBeVisible();

    // Sink capacity = mass × cp = 0.2 kg × 900 J/(kg·K) = 180 J/K (aluminium, Incropera & DeWitt, Table A.1).
    const sinks = within(inputs).getByLabelText('Sinks');
    expect(within(sinks).getByText('180 J/K')).toBeVisible();
    expect(within(sinks).getByText('1.1 K/W at a 50 K rise')).toBeVisible();
    expect(within(sinks).getByText('enclosure')).toBeVisible();

    // One pass: 2 segments + 20 × 2 pulse segments = 42; the third starts at 10 s + 5 s = 15 s.
    const segments = within(inputs).getByLabelText('Profile segments');
    expect(within(segments).getByText('15 s')).toBeVisible();
    // Of the 25 rows listed, the pulses at 3 A are rows 3, 5, …, 25: twelve of them.
    expect(within(segments).getAllByText('24 V in, 12 V out, 3 A')).toHaveLength(12);
    expect(within(segments).getByText('25')).toBeVisible();
    expect(within(segments).queryByText('26')).toBeNull();
    expect(screen.getByText('Showing the first 25 of 42 segments; 17 more segments not listed.')).toBeVisible();

    // Target junction temperature = Tj,max − margin = 150 − 20 = 130 °C (docs/study-format.md, marginK).
    expect(screen.getByText('Q1 130 °C')).toBeVisible();

    expect(await screen.findByText(/Q1: the Foster set of 2 terms is converted to a Cauer ladder/)).toBeVisible();

    const cautions = screen.getByTestId('report-section-cautions');
    expect(within(cautions).getByText(/thermocouple on the case, or the electrical method of JEDEC JESD51-1/)).toBeVisible();
    expect(within(cautions).getByText(/Surfaces above about 60 °C can burn on contact/)).toBeVisible();
    expect(within(cautions).getByText(/defer to IEC 62368-1 and to local codes/)).toBeVisible();
    // No mains flag and no mention of the mains in the text: no mains line.
    expect(within(cautions).queryByText(/mains wiring/)).toBeNull();

    const comment = await screen.findByTestId('report-comment-5');
    expect(within(comment).getByText('Pinned at 38 s')).toBeVisible();
    expect(within(comment).getByText(COMMENTS[0].body)).toBeVisible();
  });

  // PHYSICS.md §7: mains wiring follows local electrical codes and is done by qualified people.
  it('gives the mains-wiring caution for a study flagged mains-fed', async () => {
    openReport(studyAt('draft', 3, { document: { ...DOCUMENT, mainsFed: true } }));
    const caution = await screen.findByTestId('report-mains-caution');
    expect(caution).toHaveTextContent(/fed from the mains: its mains wiring follows the local electrical codes and is done by qualified people/);
    expect(screen.queryByTestId('report-mains-hint')).toBeNull();
  });

  it('prompts for the mains flag when it is absent and the text names a transformer', async () => {
    openReport(studyAt('draft', 3, { document: { ...DOCUMENT, description: 'Demo data: fed from a transformer.' } }));
    const hint = await screen.findByTestId('report-mains-hint');
    expect(hint).toHaveTextContent(/mentions a transformer; tick 'Mains-fed'/);
    expect(screen.queryByTestId('report-mains-caution')).toBeNull();
  });

  it('names the field at fault when the saved document cannot be read, and still gives the cautions', async () => {
    const broken = { ...DOCUMENT, devices: [{ ...DOCUMENT.devices[0], sink: 'S9' }] };
    openReport(studyAt('draft', 3, { document: broken }));

    const inputs = await screen.findByTestId('report-section-inputs');
    // The message is the study parser's, in the form the format reference documents.
    expect(within(inputs).getByText('devices[0].sink: no sink has the id "S9" (sinks: S1)')).toBeVisible();
    expect(await screen.findByText('No results: the saved document could not be read (see the inputs).')).toBeVisible();
    expect(within(screen.getByTestId('report-section-cautions')).getByText(/JEDEC JESD51-1/)).toBeVisible();
  });
});
