import { useTranslation } from 'react-i18next';
import { useOfficeDates } from '@/lib/office-dates';
import type { ChecklistItem, VoiceNoteResponse } from '@yardcall/shared';
import { NotePlayer } from '@/lib/audio/note-player';
import type { WaveformHandle } from '@/lib/audio/waveform-player';

export interface InspectionNotesProps {
  notes: VoiceNoteResponse[];
  items: ChecklistItem[];
  // Filled with each note's player so an item's "play note" can reach it.
  registerPlayer: (noteId: string, handle: WaveformHandle | null) => void;
}

export function InspectionNotes({ notes, items, registerPlayer }: InspectionNotesProps) {
  const { t } = useTranslation();
  const dates = useOfficeDates();
  if (notes.length === 0) return <p>{t('inspections.detail.noNotes')}</p>;
  const itemsByKey = new Map(items.map((item) => [item.key, item]));
  return (
    <ul className="flex flex-col gap-6" data-testid="inspection-notes">
      {notes.map((note) => {
        const item = itemsByKey.get(note.itemKey);
        const where = item ? `${item.title}, ${item.positionLabel}` : note.itemKey;
        const headingId = `note-${note.id}-heading`;
        return (
          <li key={note.id}>
            <article
              id={`note-${note.id}`}
              aria-labelledby={headingId}
              tabIndex={-1}
              className="flex scroll-mt-4 flex-col gap-2 rounded-xl border-2 border-line bg-surface p-4"
              data-testid="inspection-note"
            >
              <h3 id={headingId} className="text-lg font-bold">
                {t('inspections.detail.noteAt', { where })}
              </h3>
              <p className="text-muted">{dates.dateTime(note.createdAt)}</p>
              {note.heard ? (
                <p>
                  <span className="font-bold">{t('inspections.items.heard')}</span> “{note.heard}”
                </p>
              ) : null}
              <NotePlayer
                ref={(handle) => registerPlayer(note.id, handle)}
                noteId={note.id}
                mimeType={note.mimeType}
                durationMs={note.durationMs}
                label={where}
              />
            </article>
          </li>
        );
      })}
    </ul>
  );
}
