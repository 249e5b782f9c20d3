import type { LaunchPrerequisiteView } from '@catline/contracts';
import { describe, expect, it } from 'vitest';
import { startBlockedBy, untickedPrerequisites } from './launch-prerequisites-model.js';

const item = (name: string, ticked: boolean): LaunchPrerequisiteView => ({
  name,
  ticked,
  tickedBy: ticked ? 'Bram Osterwick' : null,
  tickedAt: ticked ? '2026-12-02T09:40:00.000Z' : null,
});

describe('launch prerequisites', () => {
  const launchPrerequisites = [item('Deck swept', true), item('Plane guard up', false), item('Crews manned', false)];

  it('names the prerequisites not ticked, in the profile’s order', () => {
    expect(untickedPrerequisites({ launchPrerequisites })).toEqual(['Plane guard up', 'Crews manned']);
  });

  it('says what keeps launching from starting, and nothing once all are ticked', () => {
    expect(startBlockedBy({ launchPrerequisites })).toBe(
      'Tick every launch prerequisite first; not ticked: Plane guard up, Crews manned.',
    );
    expect(startBlockedBy({ launchPrerequisites: [item('Deck swept', true)] })).toBeNull();
    expect(startBlockedBy({ launchPrerequisites: [] })).toBeNull();
  });
});
