/** Problems with what was asked of a study (not with the geometry, which has its own errors). */

export type StudyErrorCode = 'no-variant' | 'bad-lift' | 'width-along' | 'axis-side';

export class StudyError extends Error {
  constructor(readonly code: StudyErrorCode, message: string) {
    super(message);
    this.name = 'StudyError';
  }
}
