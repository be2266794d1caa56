export const SIGN_IN_FAILED = 'Email or password is not right.';
