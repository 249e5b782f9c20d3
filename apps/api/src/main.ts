import 'reflect-metadata';
import { Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { NestFactory } from '@nestjs/core';
import { AppModule } from './app.module.js';
import { configureApp } from './app.setup.js';
import type { Environment } from './config/environment.js';

const app = await NestFactory.create(AppModule);
configureApp(app);
const config = app.get<ConfigService<Environment, true>>(ConfigService);
await app.listen(config.get('PORT'), config.get('HOST'));
new Logger('Catline').log(`Listening on http://${config.get('HOST')}:${config.get('PORT')}`);
