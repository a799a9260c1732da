import { useEffect, useState } from 'react';
import { useTranslation } from 'react-i18next';
import { ErrorAlert, Loading } from '@/components/ui/alert';
import { BrandMark } from '@/components/ui/brand-mark';
import { buttonClassName } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/layout';
import { GloveScreen } from '@/features/walkaround/components/glove-screen';
import { finishPath } from '@/features/walkaround/walkaround-paths';
import { setUnauthorizedHandler } from '@/lib/api-client';
import { describeError } from '@/lib/errors';
import { getOfflineRuntime, type LocalWalkaround } from '@/lib/offline';
import { hasSession, signInPath } from '@/lib/sign-in';
import { SkipToMain } from './layout/skip-to-main';

type Loaded =
  | { status: 'loading' }
  | { status: 'ready'; walkaround: LocalWalkaround | null }
  | { status: 'failed'; error: unknown };

function goToSignIn(): void {
  window.location.replace(signInPath(window.location.pathname));
}

// The glove screen as a page of its own (see run-main.tsx), framed like the app's focused shell:
// a slim bar with the home link, then the walk-around. Plain links: there is no router here.
export function RunPage({ clientId }: { clientId: string }) {
  const { t } = useTranslation();
  const [loaded, setLoaded] = useState<Loaded>({ status: 'loading' });
  const signedIn = hasSession();

  useEffect(() => {
    if (!signedIn) {
      goToSignIn();
      return;
    }
    setUnauthorizedHandler(goToSignIn);
    const { engine, store } = getOfflineRuntime();
    // No IndexedDB (a private window in some browsers): the engine has nothing to send.
    engine.start().catch(() => undefined);
    let cancelled = false;
    store.getWalkaround(clientId).then(
      (walkaround) => !cancelled && setLoaded({ status: 'ready', walkaround }),
      (error: unknown) => !cancelled && setLoaded({ status: 'failed', error }),
    );
    return () => {
      cancelled = true;
      engine.stop();
      setUnauthorizedHandler(null);
    };
  }, [clientId, signedIn]);

  return (
    <div className="flex min-h-screen flex-col">
      <SkipToMain />
      <header className="border-b-4 border-primary bg-surface">
        <div className="mx-auto flex max-w-6xl items-center px-3">
          <a href="/" className="inline-flex min-h-tap items-center no-underline" aria-label={t('nav.homeLink')}>
            <BrandMark label={t('app.name')} />
          </a>
        </div>
      </header>
      <main id="main" tabIndex={-1} className="mx-auto w-full max-w-6xl flex-1 px-3 py-2 focus:outline-none">
        {loaded.status === 'loading' ? <Loading label={t('common.loading')} /> : null}
        {loaded.status === 'failed' ? <ErrorAlert>{describeError(loaded.error)}</ErrorAlert> : null}
        {loaded.status === 'ready' && !loaded.walkaround ? (
          <EmptyState title={t('walkaround.run.notHere')}>
            <a href="/driver/start" className={buttonClassName()}>
              {t('start.title')}
            </a>
          </EmptyState>
        ) : null}
        {loaded.status === 'ready' && loaded.walkaround?.inspection.signed ? (
          <SignedRedirect to={finishPath(clientId)} />
        ) : null}
        {loaded.status === 'ready' && loaded.walkaround && !loaded.walkaround.inspection.signed ? (
          <GloveScreen walkaround={loaded.walkaround} onFinished={() => window.location.assign(finishPath(clientId))} />
        ) : null}
      </main>
    </div>
  );
}

// Signed on this phone: the walk-around is read-only; its report waits on the finish screen.
function SignedRedirect({ to }: { to: string }) {
  useEffect(() => window.location.replace(to), [to]);
  return null;
}
