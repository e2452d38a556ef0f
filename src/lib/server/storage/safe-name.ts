// The name a person's file arrived with, made safe to keep and show (never used as a path).

const MAX = 100;

/** True when the name tries to point at a folder: slashes, backslashes or a `..` part. */
export function isPathLike(name: string): boolean {
  return /[\\/]/.test(name) || name === '..' || name === '.';
}

/** The name with control characters and anything but letters, digits, space, `._-()` replaced. */
export function safeName(name: string): string {
  const cleaned = name
    .normalize('NFC')
    // biome-ignore lint/suspicious/noControlCharactersInRegex: control characters are what is taken out
    .replace(/[\u0000-\u001f\u007f]/g, '')
    .replace(/[^\p{L}\p{N} ._()-]/gu, '_')
    .replace(/\s+/g, ' ')
    .replace(/^[.\s]+/, '')
    .trim();
  return (cleaned || 'photo').slice(0, MAX);
}
