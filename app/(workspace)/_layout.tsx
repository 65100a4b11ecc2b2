import { Slot } from 'expo-router';

import { SessionGate } from '@/features/shell/session-gate';
import { WorkspaceShell } from '@/features/shell/workspace-shell';
import { CurrentTeamProvider } from '@/features/team/current-team';

export default function WorkspaceLayout() {
  return (
    <SessionGate require="signed-in">
      {(session) =>
        session && (
          <CurrentTeamProvider memberships={session.memberships}>
            <WorkspaceShell session={session}>
              <Slot />
            </WorkspaceShell>
          </CurrentTeamProvider>
        )
      }
    </SessionGate>
  );
}
