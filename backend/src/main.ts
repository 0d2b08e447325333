import 'reflect-metadata';
import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { AppModule } from './app.module';
import { setupApp } from './setup-app';

async function bootstrap(): Promise<void> {
  const app = await NestFactory.create<NestExpressApplication>(AppModule, { bufferLogs: true, bodyParser: false });
  app.set('trust proxy', 'loopback');
  setupApp(app);
  const port = Number(process.env.PORT ?? 3000);
  await app.listen(port);
  console.log(`Causeway is listening on http://localhost:${port}`);
}

void bootstrap();
