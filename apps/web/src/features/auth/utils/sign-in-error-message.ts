// The codes the API's OAuth callback redirects with (apps/api auth routes).
const messages: Record<string, string> = {
  denied: 'Sign-in was cancelled or refused at the provider. You can try again.',
  provider: 'The sign-in provider could not be reached or did not confirm who you are. Please try again.',
};

const longestShownCode = 60;

/** The sentence for an `?error=` code the sign-in redirect carries; unknown codes are shown as sent. */
export function signInErrorMessage(code: string): string {
  const known = messages[code];
  if (known) return known;
  return `Sign-in did not complete (${code.slice(0, longestShownCode)}). Please try again.`;
}
