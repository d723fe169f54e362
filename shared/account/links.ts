/** Where the links in account mail send the browser back to (paths on this site). */
export const verifyCallbackUrl = '/verify?verified=1';
export const resetPasswordPath = '/reset-password';
