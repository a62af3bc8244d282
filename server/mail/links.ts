/**
 * The address people open links at. Set PUBLIC_URL in production (e.g. https://boxwright.example.org);
 * links are never built from the request's Host header, which a caller controls (password-reset poisoning).
 */
export type PublicUrl = () => string;

export function linkTo(publicUrl: PublicUrl, path: string): string {
  return publicUrl().replace(/\/+$/, '') + path;
}
