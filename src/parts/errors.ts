/** Typed error for parts whose numbers cannot make a shape, with a message a porter can act on. */

export type PartsErrorCode =
  /** The valve's own numbers do not make a head (stem too thick, head too thin, back cut reaching the stem). */
  | 'valve-shape'
  /** The seat's numbers do not fit the valve (throat past the seat's inner edge, top cut never reaching the deck). */
  | 'seat-shape'
  /** The test bore does not fit round the seat. */
  | 'bore-shape'
  /** The outline's anchor corners are missing, on one side of the valve, or do not split off the valve pocket. */
  | 'anchors'
  /** A part is missing that another needs (a seat with no valve, a seat with no bore). */
  | 'missing-part';

export class PartsError extends Error {
  readonly code: PartsErrorCode;
  /** Which part the problem is in. */
  readonly part: 'valve' | 'seat' | 'bore' | 'outline';

  constructor(code: PartsErrorCode, part: PartsError['part'], message: string) {
    super(message);
    this.name = 'PartsError';
    this.code = code;
    this.part = part;
  }
}
