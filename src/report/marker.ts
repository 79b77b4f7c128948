/**
 * The hidden marker that lets the action find its own PR comment for a series and update it in
 * place. Percent-encoding keeps any series name inside one HTML comment: no `-->` can close it
 * early and no newline can split it.
 * @example commentMarker('linux x64') // 'bellgate:series=linux%20x64'
 */
export function commentMarker(series: string): string {
  return `bellgate:series=${safeMarker(series)}`;
}

/**
 * Percent-encode everything but [A-Za-z0-9._~-] (and a `-` that starts `--`), so the text is safe
 * inside `<!-- ... -->`: it can contain neither `>` nor the `--` that HTML forbids in comments.
 * @example safeMarker('a-->b') // 'a%2D-%3Eb'
 */
export function safeMarker(s: string): string {
  return encodeURIComponent(s)
    .replace(/[!'()*]/g, (ch) => `%${ch.charCodeAt(0).toString(16).toUpperCase()}`)
    .replace(/-(?=-)/g, '%2D');
}

/** The first line of a comment: `<!-- marker -->`; a marker from commentMarker passes unchanged. */
export function markerLine(marker: string): string {
  const safe = marker.replace(/[^A-Za-z0-9._~:=/%-]/g, (ch) => safeMarker(ch)).replace(/-(?=-)/g, '%2D');
  return `<!-- ${safe} -->`;
}
