/** Typed error for flow-reading settings a porter can set wrong. */

/** A reading setting out of its range; the message names the setting and the range. */
export class ReadingSettingError extends Error {
  override readonly name = 'ReadingSettingError';
  constructor(
    /** the option's name in ReadingOptions */
    readonly setting: string,
    message: string,
  ) {
    super(message);
  }
}
