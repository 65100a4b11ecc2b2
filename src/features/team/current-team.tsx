import { createContext, useCallback, useContext, useMemo, useState, type ReactNode } from 'react';

import type { Membership } from '@/features/auth/types';

import { loadCurrentTeamId, saveCurrentTeamId } from './team-storage';

export type CurrentTeam = {
  /** The team the workspace shows; null only for an account without any team. */
  team: Membership | null;
  memberships: readonly Membership[];
  selectTeam: (teamId: number) => void;
};

const CurrentTeamContext = createContext<CurrentTeam | null>(null);

export type CurrentTeamProviderProps = { memberships: readonly Membership[]; children: ReactNode };

/** Holds the team picked in the switcher; falls back to the first team when the saved one is gone. */
export function CurrentTeamProvider({ memberships, children }: CurrentTeamProviderProps) {
  const [picked, setPicked] = useState<number | null>(loadCurrentTeamId);
  const selectTeam = useCallback((teamId: number) => {
    saveCurrentTeamId(teamId);
    setPicked(teamId);
  }, []);
  const value = useMemo<CurrentTeam>(
    () => ({
      team: memberships.find((m) => m.teamId === picked) ?? memberships[0] ?? null,
      memberships,
      selectTeam,
    }),
    [memberships, picked, selectTeam],
  );
  return <CurrentTeamContext.Provider value={value}>{children}</CurrentTeamContext.Provider>;
}

/** Call inside the signed-in workspace, below CurrentTeamProvider. */
export function useCurrentTeam(): CurrentTeam {
  const value = useContext(CurrentTeamContext);
  if (!value) throw new Error('useCurrentTeam used outside CurrentTeamProvider');
  return value;
}
