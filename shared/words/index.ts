// Larderly's product words, shared by the server (e-mails, push, CSV) and the client (every screen).
// Pure: no zod, no server code; safe for the client's first screen. US English throughout.
export * from './dates';
export * from './units';
export * from './names';
export * from './countdown';
export * from './cautions';
export * from './seal-check';
export * from './ingredients';
