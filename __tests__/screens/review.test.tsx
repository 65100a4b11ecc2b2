import { fireEvent, screen, waitFor, within } from 'expo-router/testing-library';
import type { ValidationError } from 'yup';

import { api } from '@/api/client';
import type { Role } from '@/features/auth/types';
import type { Study } from '@/features/studies/types';
import { reviewSchema } from '@/validation';

import { ok, routeApi } from './support/http';
import { renderApp } from './support/render-app';
import { PEOPLE, revisionsBy, sessionAs, studyAt } from './support/teamwork-fixtures';

jest.mock('@/api/client', () => ({
  apiBaseUrl: '/api',
  api: { get: jest.fn(), post: jest.fn(), delete: jest.fn() },
}));

const mockedApi = api as unknown as Record<'get' | 'post' | 'delete', jest.Mock>;

/** Opens study 21 as `role`; its revisions were saved by `authors` in order. */
function openStudy(role: Role, study: Study, authors: { id: number; name: string }[], extra = {}) {
  routeApi(mockedApi, {
    'GET /session': () => ok(sessionAs(role)),
    'GET /studies/21': () => ok({ study }),
    'GET /studies/21/revisions': () => ok({ revisions: revisionsBy(authors) }),
    'GET /studies/21/reviews': () => ok({ reviews: [] }),
    'GET /studies/21/comments': () => ok({ comments: [] }),
    ...extra,
  });
  renderApp('/studies/21');
}

const panel = () => screen.findByTestId('review-panel');

describe('review actions on the study view', () => {
  beforeEach(() => jest.clearAllMocks());

  it('offers a reviewer approve and request changes on a study in review', async () => {
    openStudy('reviewer', studyAt('in_review', 2), [PEOPLE.designer, PEOPLE.designer]);

    const review = await panel();
    expect(await within(review).findByRole('button', { name: 'Approve' })).toBeVisible();
    expect(within(review).getByRole('button', { name: 'Request changes' })).toBeVisible();
    expect(within(review).queryByRole('button', { name: 'Submit for review' })).toBeNull();
  });

  it('needs a comment to request changes, then sends it with the revision under review', async () => {
    const sentBack = studyAt('changes_requested', 2);
    openStudy('reviewer', studyAt('in_review', 2), [PEOPLE.designer, PEOPLE.designer], {
      'POST /studies/21/review': () => ok({ study: sentBack }),
    });

    const review = await panel();
    fireEvent.press(await within(review).findByRole('button', { name: 'Request changes' }));
    // The message is the shared schema's (the server refuses the same empty comment).
    const expected = await reviewSchema
      .validate({ decision: 'changes_requested', comment: '' })
      .then(() => 'the schema accepted an empty comment')
      .catch((error: ValidationError) => error.message);
    expect(await within(review).findByText(expected)).toBeVisible();
    expect(mockedApi.post).not.toHaveBeenCalled();

    fireEvent.changeText(within(review).getByLabelText('Review comment'), '  Use the 45 °C enclosure ambient. ');
    fireEvent.press(within(review).getByRole('button', { name: 'Request changes' }));

    await waitFor(() =>
      expect(mockedApi.post).toHaveBeenCalledWith('/studies/21/review', {
        decision: 'changes_requested',
        comment: 'Use the 45 °C enclosure ambient.',
        revision: 2,
      }),
    );
  });

  it('offers the author of a draft to submit it, and nothing to decide', async () => {
    openStudy('designer', studyAt('draft', 1), [PEOPLE.designer], {
      'POST /studies/21/submit': () => ok({ study: studyAt('in_review', 1) }),
    });

    const review = await panel();
    fireEvent.press(await within(review).findByRole('button', { name: 'Submit for review' }));

    await waitFor(() => expect(mockedApi.post).toHaveBeenCalledWith('/studies/21/submit'));
    expect(within(review).queryByRole('button', { name: 'Approve' })).toBeNull();
  });

  it('gives nobody a decision on a revision they saved themselves', async () => {
    // The owner saved revision 2 of the designer's study and may review in general, but not this revision.
    openStudy('owner', studyAt('in_review', 2), [PEOPLE.designer, PEOPLE.owner]);

    const review = await panel();
    expect(await within(review).findByText('You saved this revision, so another reviewer or owner decides on it.')).toBeVisible();
    expect(within(review).queryByRole('button', { name: 'Approve' })).toBeNull();
    expect(within(review).queryByRole('button', { name: 'Request changes' })).toBeNull();
  });

  it('shows a designer who is not the author neither submit nor approve', async () => {
    const otherDesigner = { id: 44, name: 'Dee Other' };
    openStudy('designer', studyAt('draft', 1, { author: otherDesigner }), [otherDesigner]);

    const review = await panel();
    expect(await within(review).findByText('Its author submits it for review when it is ready.')).toBeVisible();
    expect(within(review).queryAllByRole('button')).toHaveLength(0);
  });

  it('shows the approval in force: revision, reviewer and time', async () => {
    const approved = studyAt('approved', 3, {
      approval: { revision: 3, reviewer: { id: PEOPLE.reviewer.id, name: PEOPLE.reviewer.name }, at: '2025-05-04T12:30:00.000Z' },
    });
    openStudy('designer', approved, [PEOPLE.designer, PEOPLE.designer, PEOPLE.designer]);

    const review = await panel();
    expect(await within(review).findByText('Revision 3 approved')).toBeVisible();
    expect(within(review).getByText(new RegExp(`^By ${PEOPLE.reviewer.name}, `))).toBeVisible();
    expect(within(review).queryAllByRole('button')).toHaveLength(0);
  });
});
