// Shared by the sign-up form and the auth server, so both refuse the same passwords.
export const MIN_PASSWORD_LENGTH = 10;
