import { useSearchParams } from 'react-router-dom';
import { CenteredLayout } from '../../../components/layouts/centered-layout';
import { useDocumentTitle } from '../../../components/ui/use-document-title';
import { Wordmark } from '../../../components/ui/wordmark';
import { SignInPanel } from '../../../features/auth/components/sign-in-panel';

export default function SignInPage() {
  const [params] = useSearchParams();
  useDocumentTitle('Sign in');
  return (
    <CenteredLayout>
      <Wordmark size="lg" />
      <h1 className="mt-6 text-xl font-bold text-ink">Sign in</h1>
      <p className="mb-6 mt-2 leading-relaxed text-ink-soft">
        Ionfolio is the laboratory&rsquo;s reviewed, versioned library of 70 eV EI mass spectra: identify
        unknown peaks against it, and add reference spectra that a second person approves.
      </p>
      <SignInPanel returnTo={params.get('returnTo')} errorCode={params.get('error')} />
    </CenteredLayout>
  );
}
