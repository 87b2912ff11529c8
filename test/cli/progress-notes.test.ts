import { describe, expect, it, vi } from 'vitest';
import { PROGRESS_AFTER_MS, progressNotes } from '../../src/cli/io.js';

/** Progress notes: on a terminal only (io.progress present), and only once a command has run for over a second. */
describe('progressNotes', () => {
  it('stays silent for the first second, then notes each stage and clears the line at the end', () => {
    vi.useFakeTimers();
    try {
      const notes: string[] = [];
      const progress = progressNotes({ out: () => {}, err: () => {}, progress: (text) => notes.push(text) });
      progress.note('deriving the interferers');
      vi.advanceTimersByTime(PROGRESS_AFTER_MS + 1);
      progress.note('drawing the pictures');
      progress.done();
      expect(notes).toEqual(['drawing the pictures', '']);
    } finally {
      vi.useRealTimers();
    }
  });

  it('writes nothing when stderr is not a terminal (no io.progress)', () => {
    vi.useFakeTimers();
    try {
      const err: string[] = [];
      const progress = progressNotes({ out: () => {}, err: (text) => err.push(text) });
      vi.advanceTimersByTime(5000);
      progress.note('stage');
      progress.done();
      expect(err).toEqual([]);
    } finally {
      vi.useRealTimers();
    }
  });

  it('a short run that never noted anything leaves the line alone', () => {
    const notes: string[] = [];
    const progress = progressNotes({ out: () => {}, err: () => {}, progress: (text) => notes.push(text) });
    progress.note('stage');
    progress.done();
    expect(notes).toEqual([]);
  });
});
