import { useMatches } from 'react-router';

// What a screen asks of the shell around it, set as its route's `handle`.
export interface ShellHandle {
  // The glove screen: every line of the phone goes to the walk-around, so the shell keeps only a
  // slim bar (no navigation, no footer).
  focused?: boolean;
}

export function useFocusedScreen(): boolean {
  return useMatches().some((match) => (match.handle as ShellHandle | undefined)?.focused === true);
}
