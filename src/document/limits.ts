/** Bounds a section file must keep: big enough for any real port, small enough that a hostile file cannot stall the app. */

/** Largest file accepted, bytes of UTF-8 text (5 MB). A traced section with thousands of points is well under 1 MB. */
export const MAX_FILE_BYTES = 5_000_000;
/** Largest |x| or |y|, document units (100 m in mm: far beyond any head, so only nonsense is refused). */
export const MAX_COORDINATE = 1e5;
/** Largest fillet radius, document units. */
export const MAX_FILLET_RADIUS = 1e5;
/** Most vertices in one section, outline and islands together. */
export const MAX_SECTION_VERTICES = 20_000;
/** Most `via` points on one curve edge. */
export const MAX_VIA_POINTS = 200;
/** Most islands in one section. */
export const MAX_ISLANDS = 100;
/** Most variants in one file. */
export const MAX_VARIANTS = 100;
/** Length of a variant, island or wall name, characters. */
export const MAX_NAME_LENGTH = 80;
/** A character a name or title may not hold: they are one-line labels in the view and the command output. */
export const CONTROL_CHARACTER = /[\u0000-\u001f\u007f]/;
/** Length of the title, characters. */
export const MAX_TITLE_LENGTH = 120;
/** Length of a variant note, characters. */
export const MAX_NOTE_LENGTH = 4000;

/** A file size for a message, in MB to one decimal: "5.0 MB". */
export function formatMegabytes(bytes: number): string {
  return `${(bytes / 1e6).toFixed(1)} MB`;
}

/** UTF-8 byte length of `text` without building the encoded bytes. */
export function utf8Length(text: string): number {
  let bytes = 0;
  for (let i = 0; i < text.length; i++) {
    const code = text.charCodeAt(i);
    if (code < 0x80) bytes += 1;
    else if (code < 0x800) bytes += 2;
    else if (code >= 0xd800 && code <= 0xdbff && i + 1 < text.length) {
      const next = text.charCodeAt(i + 1);
      if (next >= 0xdc00 && next <= 0xdfff) {
        bytes += 4;
        i++;
      } else bytes += 3;
    } else bytes += 3;
  }
  return bytes;
}

/** Longest length a part may have (diameters, widths, lift), document units: the same bound as a coordinate. */
export const MAX_PART_LENGTH = MAX_COORDINATE;
/** Largest measured port area, document units squared. */
export const MAX_PORT_AREA = MAX_COORDINATE * MAX_COORDINATE;
/** Largest lean of the valve axis from straight down, degrees (real heads lean well under this). */
export const MAX_VALVE_INCLINATION_DEG = 75;
