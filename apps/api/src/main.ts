import 'reflect-metadata';
import { Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { NestFactory } from '@nestjs/core';
import { AppModule } from './app.module.js';
import { configureApp } from './app.setup.js';
import type { Environment } from './config/environment.js';
import { shareSocketRoomsWhenConfigured } from './gateway/redis-io.adapter.js';

// Once a stop signal arrives, requests not yet started are refused (503, Connection: close) while those
// in flight finish: otherwise clients on kept-alive connections keep the server from ever closing.
const app = await NestFactory.create(AppModule, { return503OnClosing: true });
configureApp(app);
await shareSocketRoomsWhenConfigured(app);
const config = app.get<ConfigService<Environment, true>>(ConfigService);
await app.listen(config.get('PORT'), config.get('HOST'));
new Logger('Catline').log(`Listening on http://${config.get('HOST')}:${config.get('PORT')}`);
