import { CreateFoundation1764633600000 } from './1764633600000-CreateFoundation';

// Every migration in order, passed as classes; add new ones at the end.
export const MIGRATIONS = [CreateFoundation1764633600000];
