const messages: Record<string, string> = {
  access_denied: 'Sign-in was cancelled at the provider. You can try again.',
  oauth_failed: 'The sign-in provider did not confirm who you are. Please try again.',
  state_mismatch: 'The sign-in took too long or was started in another tab. Please start it again.',
  session_expired: 'Your session has ended. Please sign in again.',
  account_disabled: 'This account may not sign in. Ask an admin of your Ionfolio.',
};

const longestShownCode = 60;

/** The sentence for an `?error=` code the sign-in redirect carries; unknown codes are shown as sent. */
export function signInErrorMessage(code: string): string {
  const known = messages[code];
  if (known) return known;
  return `Sign-in did not complete (${code.slice(0, longestShownCode)}). Please try again.`;
}
