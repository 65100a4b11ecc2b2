import { useLocalSearchParams } from 'expo-router';

import { InvitationScreen } from '@/features/invitations/invitation-screen';

export default function InvitationRoute() {
  const { token } = useLocalSearchParams<{ token: string }>();
  return <InvitationScreen key={token} token={token} />;
}
