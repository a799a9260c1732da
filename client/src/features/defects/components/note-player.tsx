import { useEffect, useId, useRef } from 'react';
import { useTranslation } from 'react-i18next';
import type { InspectionResponse, VoiceNoteResponse } from '@yardcall/shared';
import { ErrorAlert } from '@/components/ui/alert';
import { describeError } from '@/lib/errors';
import { useInspection } from '@/lib/api/inspections';
import { useNoteAudio } from '@/lib/audio/get-note-audio';

function NoteAudio({ note }: { note: VoiceNoteResponse }) {
  const { t } = useTranslation();
  const audio = useNoteAudio(note.id);
  const element = useRef<HTMLAudioElement>(null);
  const heardId = useId();
  const blob = audio.data;

  // An object URL for the fetched audio, freed when the player goes away.
  useEffect(() => {
    const player = element.current;
    if (!player || !blob) return undefined;
    const url = URL.createObjectURL(blob);
    player.src = url;
    return () => {
      player.removeAttribute('src');
      URL.revokeObjectURL(url);
    };
  }, [blob]);

  return (
    <figure className="flex flex-col gap-1" data-testid="defect-note">
      <figcaption className="font-bold">
        {t('mechanic.note.title', { seconds: Math.max(1, Math.round(note.durationMs / 1000)) })}
      </figcaption>
      {note.heard ? <p id={heardId}>{t('mechanic.note.heard', { text: note.heard })}</p> : null}
      {audio.isError ? (
        <ErrorAlert>{describeError(audio.error)}</ErrorAlert>
      ) : (
        // A driver's voice note has no captions to offer: what was heard of it, when anything was, is its
        // text alternative, shown above and tied to the player as its description.
        // eslint-disable-next-line jsx-a11y-x/media-has-caption
        <audio
          ref={element}
          controls
          preload="metadata"
          aria-label={t('mechanic.note.play')}
          aria-describedby={note.heard ? heardId : undefined}
          aria-busy={blob ? undefined : true}
          className="w-full max-w-md"
          data-testid="defect-note-audio"
          data-ready={blob ? 'true' : 'false'}
        />
      )}
    </figure>
  );
}

const notesOf = (inspection: InspectionResponse) => inspection.notes;
// A submitted report's notes do not change.
const NOTES_STALE_MS = 5 * 60_000;

// The driver's voice notes at this defect's item, from the report it came from (the one query for it).
export function NotePlayer({ inspectionId, itemKey }: { inspectionId: string; itemKey: string }) {
  const { t } = useTranslation();
  const notes = useInspection(inspectionId, { select: notesOf, staleTime: NOTES_STALE_MS });
  if (notes.isPending) return <p className="text-muted">{t('mechanic.note.loading')}</p>;
  if (notes.isError) return <ErrorAlert>{describeError(notes.error)}</ErrorAlert>;
  const here = notes.data.filter((note) => note.itemKey === itemKey);
  if (here.length === 0) return <p className="text-muted">{t('mechanic.note.none')}</p>;
  return (
    <div className="flex flex-col gap-3">
      {here.map((note) => (
        <NoteAudio key={note.id} note={note} />
      ))}
    </div>
  );
}
