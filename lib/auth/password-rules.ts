/** Password length bounds, shared by forms (client) and the server's checks. */
export const minPasswordLength = 10;
export const maxPasswordLength = 128;
