// Where the training screens live; the app's router and the nav use the same paths.
export const PRACTICE_PATH = '/training/practice';
export const FEEDBACK_LIST_PATH = '/training/feedback';

export function feedbackPath(attemptId: string): string {
  return `${FEEDBACK_LIST_PATH}/${encodeURIComponent(attemptId)}`;
}

export function reviewPath(attemptId: string): string {
  return `/trainer/attempts/${encodeURIComponent(attemptId)}`;
}
