// Native builds keep the choice for the app's lifetime; the web build persists it (team-storage.web.ts).
let current: number | null = null;

export function loadCurrentTeamId(): number | null {
  return current;
}

export function saveCurrentTeamId(teamId: number): void {
  current = teamId;
}
