// Kept apart from the session store so that the proxy can read it without loading the database.
export const SESSION_COOKIE = "spanwright_session";
