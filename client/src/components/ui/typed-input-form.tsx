import { useId, useState, useSyncExternalStore, type FormEvent } from 'react';
import type { TypedInputEngine } from '@/lib/speech';
import { Button } from './button';

export interface TypedInputFormProps {
  engine: TypedInputEngine;
  label: string;
  sendLabel: string;
  testId: string;
}

// Where speech is not to be had: the words are typed and sent to the engine as if heard.
export function TypedInputForm({ engine, label, sendLabel, testId }: TypedInputFormProps) {
  const inputId = useId();
  const snapshot = useSyncExternalStore(engine.subscribe, engine.getSnapshot, engine.getSnapshot);
  const [text, setText] = useState('');
  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (engine.submit(text)) setText('');
  };
  return (
    <form onSubmit={submit} className="flex flex-col gap-2" data-testid={testId}>
      <label htmlFor={inputId} className="font-bold">
        {label}
      </label>
      <div className="flex gap-2">
        <input
          id={inputId}
          value={text}
          onChange={(event) => setText(event.target.value)}
          autoComplete="off"
          className="block min-h-tap w-full rounded-lg border-2 border-line bg-surface px-3 text-xl text-ink"
        />
        <Button type="submit" disabled={!snapshot.listening}>
          {sendLabel}
        </Button>
      </div>
    </form>
  );
}
