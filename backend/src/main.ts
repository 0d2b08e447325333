import 'reflect-metadata';
import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { AppModule } from './app.module';
import { setupApp } from './setup-app';

/** Express's 'trust proxy' setting from TRUST_PROXY: "true"/"false", a hop count, or comma-separated addresses and subnets. */
function trustProxy(value: string | undefined): boolean | number | string {
  if (!value) return 'loopback';
  if (value === 'true' || value === 'false') return value === 'true';
  if (/^\d+$/.test(value)) return Number(value);
  return value;
}

async function bootstrap(): Promise<void> {
  const app = await NestFactory.create<NestExpressApplication>(AppModule, { bufferLogs: true, bodyParser: false });
  // Whose X-Forwarded-For to believe for the client address (throttling is per client): loopback
  // by default; behind a load balancer TRUST_PROXY names it (subnets, a hop count, or true).
  app.set('trust proxy', trustProxy(process.env.TRUST_PROXY));
  setupApp(app);
  const port = Number(process.env.PORT ?? 3000);
  await app.listen(port);
  console.log(`Causeway is listening on http://localhost:${port}`);
}

void bootstrap();
