import { useLocalSearchParams } from 'expo-router';

import { ResetPasswordScreen } from '@/features/password-reset/reset-password-screen';

export default function ResetPasswordRoute() {
  const { token } = useLocalSearchParams<{ token: string }>();
  return <ResetPasswordScreen key={token} token={token} />;
}
