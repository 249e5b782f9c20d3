import type { LineupChange } from '@catline/contracts';
import { Injectable, Logger } from '@nestjs/common';
import { LineupChangesService } from './lineup-changes.service.js';

export type ChangeListener = (change: LineupChange) => void;

/** A place in a cycle's publishing queue, taken while the change holds the cycle lock. */
export interface FeedTicket {
  /** The changes the transaction is about to commit. */
  prepare(changes: LineupChange[]): void;
  committed(): void;
  rolledBack(): void;
  /** The commit failed in a way that leaves its outcome unknown: the change log decides. */
  uncertain(): void;
}

type TicketState = 'pending' | 'committed' | 'rolled_back' | 'uncertain';

interface Ticket {
  cycleId: number;
  firstVersion: number;
  state: TicketState;
  changes: LineupChange[];
  checking: boolean;
}

/**
 * Publishes committed changes in version order, once each. A command takes its ticket while it holds
 * the cycle's row lock, so tickets queue in version order; a ticket is published once it and every
 * ticket ahead of it has settled, however the commits' callbacks interleave afterwards.
 */
@Injectable()
export class LineupChangeFeed {
  private readonly logger = new Logger(LineupChangeFeed.name);
  private readonly queues = new Map<number, Ticket[]>();
  private readonly published = new Map<number, number>();
  private readonly committedElsewhere = new Map<number, number>();
  private readonly listeners = new Set<ChangeListener>();

  constructor(private readonly log: LineupChangesService) {}

  subscribe(listener: ChangeListener): () => void {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  }

  reserve(cycleId: number, firstVersion: number): FeedTicket {
    const ticket: Ticket = { cycleId, firstVersion, state: 'pending', changes: [], checking: false };
    const queue = this.queues.get(cycleId) ?? [];
    queue.push(ticket);
    this.queues.set(cycleId, queue);
    const settle = (state: TicketState) => {
      if (ticket.state !== 'pending') return;
      ticket.state = state;
      this.drain(cycleId);
    };
    return {
      prepare: (changes) => (ticket.changes = changes),
      committed: () => settle('committed'),
      rolledBack: () => settle('rolled_back'),
      uncertain: () => settle('uncertain'),
    };
  }

  /** The highest version of the cycle published since the app started, here or by another API process. */
  lastPublished(cycleId: number): number | undefined {
    const here = this.published.get(cycleId);
    const elsewhere = this.committedElsewhere.get(cycleId);
    return here === undefined || elsewhere === undefined ? (here ?? elsewhere) : Math.max(here, elsewhere);
  }

  /**
   * Another API process committed `version` and broadcasts it itself. Kept apart from what this
   * process published: its own earlier versions may still be on their way here and must go out.
   */
  noteCommittedElsewhere(cycleId: number, version: number): void {
    if (version > (this.committedElsewhere.get(cycleId) ?? 0)) this.committedElsewhere.set(cycleId, version);
  }

  /** The lowest version of the cycle still waiting to be published. */
  firstPending(cycleId: number): number | undefined {
    return this.queues.get(cycleId)?.[0]?.firstVersion;
  }

  private drain(cycleId: number): void {
    const queue = this.queues.get(cycleId);
    while (queue && queue.length > 0) {
      const head = queue[0];
      if (head.state === 'pending') return;
      if (head.state === 'uncertain') {
        if (!head.checking) void this.checkLog(head);
        return;
      }
      queue.shift();
      if (head.state === 'committed') head.changes.forEach((change) => this.publish(change));
    }
    this.queues.delete(cycleId);
  }

  private async checkLog(ticket: Ticket): Promise<void> {
    ticket.checking = true;
    const last = ticket.firstVersion + Math.max(ticket.changes.length, 1) - 1;
    try {
      ticket.changes = await this.log.between(ticket.cycleId, ticket.firstVersion, last);
      ticket.state = 'committed';
    } catch (error) {
      this.logger.error(
        `Cycle ${ticket.cycleId}: could not read back versions ${ticket.firstVersion}-${last}: ${String(error)}`,
      );
      ticket.state = 'rolled_back';
    }
    this.drain(ticket.cycleId);
  }

  private publish(change: LineupChange): void {
    if (change.version <= (this.published.get(change.cycleId) ?? 0)) return;
    this.published.set(change.cycleId, change.version);
    for (const listener of this.listeners) {
      try {
        listener(change);
      } catch (error) {
        this.logger.error(`A listener failed on cycle ${change.cycleId} version ${change.version}: ${String(error)}`);
      }
    }
  }
}
