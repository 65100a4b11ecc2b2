import { Slot } from 'expo-router';

import { SessionGate } from '@/features/shell/session-gate';

export default function AuthLayout() {
  return <SessionGate require="signed-out">{() => <Slot />}</SessionGate>;
}
