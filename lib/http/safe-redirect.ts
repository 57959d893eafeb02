/** Only same-site relative paths are followed after sign-in; anything else goes home. */
export function safeCallbackPath(value: string | null | undefined): string {
  if (!value || !value.startsWith("/") || value.startsWith("//") || value.startsWith("/\\")) return "/home";
  return value;
}
