// Password rules shared by the browser forms and the server (no hashing code here, so the browser can import it).
export const MIN_PASSWORD_LENGTH = 10;
