import 'express-session';

declare module 'express-session' {
  // Module augmentation needs an interface.
  interface SessionData {
    userId: number;
  }
}
