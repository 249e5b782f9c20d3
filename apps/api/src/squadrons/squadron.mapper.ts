import type { SquadronView } from '@catline/contracts';
import type { Squadron } from '../database/entities/squadron.entity.js';

export function toSquadronView(squadron: Squadron): SquadronView {
  return { id: squadron.id, shipId: squadron.shipId, name: squadron.name, code: squadron.code, email: squadron.email };
}
