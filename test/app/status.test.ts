/** Status-line messages are whole sentences: each piece ends with a full stop and none runs into the next. */
import { describe, expect, it } from 'vitest';
import { endSentence, sentences } from '../../src/app/status.ts';
import { plainMessage } from '../../src/app/document-check.ts';
import { EditError } from '../../src/editor/errors.ts';

describe('sentences', () => {
  it('ends a loader message before the next sentence (it used to read "…double quotes Your current work is unchanged.")', () => {
    const message = '"port.json" was not opened: not valid JSON at line 1, column 2: expected a field name in double quotes';
    expect(sentences(message, 'Your current work is unchanged.')).toBe(`${message}. Your current work is unchanged.`);
  });

  it('makes each line of a many-problem message a sentence of its own', () => {
    expect(sentences('title: must be a title (got "")\ntitle: must be one line', 'Your current work is unchanged.'))
      .toBe('title: must be a title (got ""). title: must be one line. Your current work is unchanged.');
  });

  it('leaves a sentence that already ends alone, inside quotes or brackets too, and drops empty pieces', () => {
    expect(endSentence('Saved as port.json.')).toBe('Saved as port.json.');
    expect(endSentence('Opened "a.json".')).toBe('Opened "a.json".');
    expect(endSentence('Is the valve shut?')).toBe('Is the valve shut?');
    expect(endSentence('(the valve is shut.)')).toBe('(the valve is shut.)');
    expect(endSentence('units must be "mm" or "inch" (got "cm")')).toBe('units must be "mm" or "inch" (got "cm").');
    expect(sentences('', '  ', 'Snapping on')).toBe('Snapping on.');
    expect(sentences('')).toBe('');
  });
});

describe('plainMessage', () => {
  it('shows a refused edit argument without the edit\'s internal name', () => {
    const error = new EditError('setFilletRadius', 'setFilletRadius: radius: A fillet radius cannot be negative; use 0 for a sharp corner.');
    expect(plainMessage(error)).toBe('A fillet radius cannot be negative; use 0 for a sharp corner.');
    expect(plainMessage(new EditError('setEdgeRole', 'setEdgeRole: role: invalid option'))).toBe('The value of role was refused: invalid option');
    expect(plainMessage(new EditError('renameVariant', 'A variant needs a name.'))).toBe('A variant needs a name.');
  });
});
