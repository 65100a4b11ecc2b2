import { Link, useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet } from 'react-native';

import { errorMessage, errorStatus } from '@/api';
import { ErrorState, LoadingState, Text } from '@/components/ui';
import { spacing } from '@/constants/theme';
import { useSession } from '@/features/auth/api';
import { AuthFrame } from '@/features/auth/components/auth-frame';
import type { Session } from '@/features/auth/types';
import { saveCurrentTeamId } from '@/features/team/team-storage';
import type { AcceptInvitationInput } from '@/validation';

import { useAcceptInvitation, useInvitation } from './api';
import { ExistingAccountForm } from './components/existing-account-form';
import { InvitationFacts } from './components/invitation-facts';
import { NewAccountForm } from './components/new-account-form';
import type { InvitationDetails } from './types';

export type InvitationScreenProps = { token: string };

/** Opens the workspace on the team just joined, when its name picks out one membership. */
function rememberJoinedTeam(session: Session, invitation: InvitationDetails) {
  const joined = session.memberships.filter((m) => m.teamName === invitation.teamName && m.role === invitation.role);
  if (joined.length === 1) saveCurrentTeamId(joined[0].teamId);
}

/** The page an invitation link opens, signed in or not. */
export function InvitationScreen({ token }: InvitationScreenProps) {
  const router = useRouter();
  const invitation = useInvitation(token);
  const session = useSession();
  const accept = useAcceptInvitation(token);
  const [gone, setGone] = useState(false);

  const homeLink = (
    <Link href={session.data ? '/' : '/sign-in'} style={styles.link}>
      <Text tone="accent" variant="bodyStrong">
        {session.data ? 'Go to your studies' : 'Go to sign-in'}
      </Text>
    </Link>
  );

  if (invitation.isPending || session.isPending) {
    return (
      <AuthFrame title="Invitation">
        <LoadingState label="Reading the invitation…" />
      </AuthFrame>
    );
  }
  if (gone || errorStatus(invitation.error) === 410) {
    return (
      <AuthFrame title="Link used or expired">
        <Text>This invitation link has been used already, was withdrawn, or has expired. Each link works once.</Text>
        <Text tone="muted">Ask the team owner to send you a new invitation.</Text>
        {homeLink}
      </AuthFrame>
    );
  }
  if (errorStatus(invitation.error) === 404) {
    return (
      <AuthFrame title="Invitation not found">
        <Text>There is no invitation at this address. Check that the whole link from the e-mail was copied.</Text>
        {homeLink}
      </AuthFrame>
    );
  }
  if (invitation.isError) {
    return (
      <AuthFrame title="Invitation">
        <ErrorState
          title="Could not read the invitation"
          message={errorMessage(invitation.error)}
          onRetry={() => invitation.refetch()}
          retrying={invitation.isFetching}
        />
      </AuthFrame>
    );
  }

  const details = invitation.data;
  const onAccept = async (input: AcceptInvitationInput) => {
    try {
      const signedIn = await accept.mutateAsync(input);
      rememberJoinedTeam(signedIn, details);
      router.replace('/');
    } catch (error) {
      if (errorStatus(error) === 410) setGone(true);
      else throw error;
    }
  };

  return (
    <AuthFrame title={`Join ${details.teamName}`}>
      <InvitationFacts invitation={details} />
      {details.accountExists ? (
        <ExistingAccountForm
          email={details.email}
          teamName={details.teamName}
          session={session.data ?? null}
          onAccept={onAccept}
        />
      ) : (
        <NewAccountForm
          email={details.email}
          teamName={details.teamName}
          signedInAs={session.data?.user.email}
          onAccept={onAccept}
        />
      )}
    </AuthFrame>
  );
}

const styles = StyleSheet.create({
  link: { alignSelf: 'flex-start', paddingVertical: spacing.xs },
});
