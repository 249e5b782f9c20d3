import { type INestApplication, Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { IoAdapter } from '@nestjs/platform-socket.io';
import { createAdapter } from '@socket.io/redis-adapter';
import { createClient } from 'redis';
import type { Environment } from '../config/environment.js';

const logger = new Logger('RedisIoAdapter');

/**
 * socket.io servers whose rooms span every API process: a broadcast to a room is published on Redis
 * and every process hands it to its own sockets in that room.
 */
export class RedisIoAdapter extends IoAdapter {
  private clients: Array<{ close(): Promise<void> }> = [];
  private adapterConstructor?: ReturnType<typeof createAdapter>;

  async connect(url: string): Promise<void> {
    const publisher = createClient({ url });
    const subscriber = publisher.duplicate();
    for (const client of [publisher, subscriber]) {
      // node-redis reconnects by itself; until then broadcasts wait in its queue.
      client.on('error', (error: Error) => logger.error(`Redis at ${url}: ${error.message}`));
    }
    await Promise.all([publisher.connect(), subscriber.connect()]);
    this.clients = [publisher, subscriber];
    this.adapterConstructor = createAdapter(publisher, subscriber);
    logger.log(`Socket rooms shared through Redis at ${url}`);
  }

  // Typed through IoAdapter: Nest's socket.io package may resolve another patch release of socket.io.
  override createIOServer(...args: Parameters<IoAdapter['createIOServer']>): ReturnType<IoAdapter['createIOServer']> {
    const server = super.createIOServer(...args);
    if (this.adapterConstructor) server.adapter(this.adapterConstructor);
    return server;
  }

  override async dispose(): Promise<void> {
    await Promise.all(this.clients.map((client) => client.close()));
    this.clients = [];
  }
}

/** With REDIS_URL set, the app's sockets join rooms shared by every API process; without it nothing changes. */
export async function shareSocketRoomsWhenConfigured(app: INestApplication): Promise<void> {
  const url = app.get<ConfigService<Environment, true>>(ConfigService).get('REDIS_URL', { infer: true });
  if (!url) return;
  const adapter = new RedisIoAdapter(app);
  await adapter.connect(url);
  app.useWebSocketAdapter(adapter);
}
