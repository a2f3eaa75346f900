/** Fired on window when the firm's list of submissions changed (a file was submitted). */
export const SUBMISSIONS_CHANGED = 'claybank:submissions-changed';

export function announceSubmissionsChanged(): void {
  window.dispatchEvent(new CustomEvent(SUBMISSIONS_CHANGED));
}
