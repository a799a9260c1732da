import { forwardRef, useEffect, useState } from 'react';
import { useTranslation } from 'react-i18next';
import { ErrorAlert, Loading } from '@/components/ui/alert';
import { describeError } from '@/lib/errors';
import { useAttemptAudio } from '../api/get-attempt-audio';

// The attempt's recording in a plain audio element; the page seeks it through the ref.
export const AttemptAudio = forwardRef<HTMLAudioElement, { attemptId: string; hasAudio: boolean }>(
  function AttemptAudio({ attemptId, hasAudio }, ref) {
    const { t } = useTranslation();
    const audio = useAttemptAudio(attemptId, hasAudio);
    const [url, setUrl] = useState<string | null>(null);
    useEffect(() => {
      if (!audio.data) return;
      const objectUrl = URL.createObjectURL(audio.data);
      setUrl(objectUrl);
      return () => URL.revokeObjectURL(objectUrl);
    }, [audio.data]);

    if (!hasAudio) return <p className="text-muted">{t('training.attempt.noAudio')}</p>;
    if (audio.isError) return <ErrorAlert>{describeError(audio.error)}</ErrorAlert>;
    if (!url) return <Loading label={t('training.attempt.loadingAudio')} />;
    return (
      <audio
        ref={ref}
        controls
        preload="auto"
        src={url}
        className="w-full"
        aria-label={t('training.attempt.recording')}
        data-testid="attempt-audio"
      />
    );
  },
);
