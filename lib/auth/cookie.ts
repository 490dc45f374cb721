/** The session cookie's name, in a module of its own so the proxy can use it without loading the database layer. */
export const SESSION_COOKIE = "understudy_session";
