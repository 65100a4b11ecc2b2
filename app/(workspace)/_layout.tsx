import { Slot } from 'expo-router';

import { SessionGate } from '@/features/shell/session-gate';
import { WorkspaceShell } from '@/features/shell/workspace-shell';

export default function WorkspaceLayout() {
  return (
    <SessionGate require="signed-in">
      {(session) => session && <WorkspaceShell session={session}><Slot /></WorkspaceShell>}
    </SessionGate>
  );
}
