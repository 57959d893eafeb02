/**
 * Free text from forms: names are one line, notes and reasons may have line breaks and tabs, and
 * neither may hold other control characters (NUL, escape sequences, C1 controls). Pasted text can carry
 * them invisibly; stored, they end up in e-mails, PDFs, CSV downloads and the register.
 */
export const oneLineTextPattern = /^[^\p{Cc}]*$/u;
export const multiLineTextPattern = /^(?:[^\p{Cc}]|[\t\n\r])*$/u;

export const oneLineTextMessage = "Use one line of text, without control characters.";
export const multiLineTextMessage = "Remove the control characters: only line breaks and tabs are allowed.";
