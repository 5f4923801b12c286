import { describe, expect, it } from 'vitest';
import { ORPHAN_GRACE_MS, orphanKeys } from './orphanPhotos.ts';

const now = new Date('2027-01-15T12:00:00Z');
const cutoff = new Date(now.getTime() - ORPHAN_GRACE_MS);
const at = (minutesAgo: number) => new Date(now.getTime() - minutesAgo * 60_000);

describe('orphanKeys', () => {
  it('picks photo objects no row names once they are older than the grace period', () => {
    const objects = [
      { key: 'photos/a/full.jpg', lastModified: at(60) }, // named by a row
      { key: 'photos/a/thumb.jpg', lastModified: at(60) },
      { key: 'photos/b/full.jpg', lastModified: at(60) }, // crash left it: no row
      { key: 'photos/b/thumb.jpg', lastModified: at(16) },
      { key: 'photos/c/full.jpg', lastModified: at(1) }, // an upload in progress: its row is moments away
      { key: 'exports/x.svg', lastModified: at(600) }, // not a photo: never ours to remove here
    ];
    expect(orphanKeys(objects, new Set(['photos/a/full.jpg', 'photos/a/thumb.jpg']), cutoff)).toEqual(['photos/b/full.jpg', 'photos/b/thumb.jpg']);
  });
  it('keeps an object written exactly at the cutoff', () => {
    expect(orphanKeys([{ key: 'photos/d/full.jpg', lastModified: cutoff }], new Set(), cutoff)).toEqual([]);
  });
});
