// The demo sign-ins the seed creates; shown by `npm start` and in the README.
export const DEMO_PASSWORD = 'yardcall-demo';
export const DEMO_SIGN_INS = [
  { role: 'driver', email: 'driver@yardcall.test' },
  { role: 'mechanic', email: 'mechanic@yardcall.test' },
  { role: 'supervisor', email: 'supervisor@yardcall.test' },
  { role: 'trainer', email: 'trainer@yardcall.test' },
  { role: 'admin', email: 'admin@yardcall.test' },
  { role: 'student driver', email: 'student@yardcall.test' },
] as const;
