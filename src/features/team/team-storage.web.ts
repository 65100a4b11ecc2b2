const KEY = 'junctura.currentTeamId';

/** The team last picked in this browser, if any. Storage can be blocked (private modes): treat that as none. */
export function loadCurrentTeamId(): number | null {
  try {
    const raw = window.localStorage.getItem(KEY);
    const id = raw === null ? NaN : Number(raw);
    return Number.isSafeInteger(id) ? id : null;
  } catch {
    return null;
  }
}

export function saveCurrentTeamId(teamId: number): void {
  try {
    window.localStorage.setItem(KEY, String(teamId));
  } catch {
    // Not persisted; the choice still holds for this page load.
  }
}
