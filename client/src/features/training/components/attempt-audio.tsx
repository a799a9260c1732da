import { forwardRef, useEffect, useMemo, useState } from 'react';
import { useTranslation } from 'react-i18next';
import type { TrainingAttemptResponse } from '@yardcall/shared';
import { ErrorAlert, Loading } from '@/components/ui/alert';
import { captionsDataUrl } from '@/lib/audio/captions';
import { describeError } from '@/lib/errors';
import { useAttemptAudio } from '@/lib/api/training';

// The attempt's recording in a plain audio element, captioned with what was heard; the page seeks it through the ref.
export const AttemptAudio = forwardRef<HTMLAudioElement, { attempt: TrainingAttemptResponse }>(function AttemptAudio(
  { attempt },
  ref,
) {
  const { t } = useTranslation();
  const hasAudio = attempt.audio !== null;
  const audio = useAttemptAudio(attempt.id, hasAudio);
  const [url, setUrl] = useState<string | null>(null);
  const captions = useMemo(() => captionsDataUrl(attempt.segments), [attempt.segments]);
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
    >
      <track kind="captions" src={captions} label={t('training.attempt.captions')} default />
    </audio>
  );
});
