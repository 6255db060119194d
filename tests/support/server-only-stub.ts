// Route modules import 'server-only'; under vitest they run on the server already.
export {};
