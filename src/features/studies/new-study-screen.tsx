import { useRouter } from 'expo-router';

import { Card, EmptyState, Page, Text } from '@/components/ui';
import { useSignedInSession } from '@/features/auth/api';
import { teamsWhereCanCreate } from '@/features/auth/roles';
import { useCurrentTeam } from '@/features/team/current-team';

import { BackLink } from './components/back-link';
import { NewStudyForm } from './components/new-study-form';

export function NewStudyScreen() {
  const router = useRouter();
  const session = useSignedInSession();
  const teams = teamsWhereCanCreate(session.memberships);
  const { team, selectTeam } = useCurrentTeam();

  return (
    <Page width="form">
      <BackLink href="/" label="Studies" />
      <Text variant="title">New study</Text>
      {teams.length === 0 ? (
        <EmptyState
          title="Reviewers cannot create studies"
          message="Your role lets you read and review your team's studies. Ask an owner or designer to start one."
        />
      ) : (
        <Card>
          <Text tone="muted">
            Start with a title; the pass element, sink and load profile are added to the study later.
          </Text>
          <NewStudyForm
            teams={teams}
            initialTeamId={team?.teamId}
            onCreated={(study) => {
              // Back in the list, the new study's team is the one shown.
              selectTeam(study.teamId);
              router.replace(`/studies/${study.id}`);
            }}
            onCancel={() => router.replace('/')}
          />
        </Card>
      )}
    </Page>
  );
}
