// Shared by the password forms and the auth server, so both refuse the same passwords.
export const MIN_PASSWORD_LENGTH = 10;
export const MAX_PASSWORD_LENGTH = 128;
