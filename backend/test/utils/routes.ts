import type { INestApplication } from '@nestjs/common';
import { RequestMethod } from '@nestjs/common';
import { METHOD_METADATA, PATH_METADATA } from '@nestjs/common/constants';
import { DiscoveryService, MetadataScanner, ModulesContainer, Reflector } from '@nestjs/core';
import type { Role } from '@causeway/shared';
import { IS_PUBLIC_KEY } from '../../src/common/decorators/public.decorator';
import { ROLES_KEY, SHOP_OWNER_KEY } from '../../src/common/decorators/roles.decorator';

export interface DiscoveredRoute {
  method: string;
  /** With the global prefix, Express-style params: /api/jobs/:id */
  path: string;
  isPublic: boolean;
  minimumRole: Role | null;
  shopOwner: boolean;
}

function joinPath(...parts: string[]): string {
  return `/${parts.map((p) => p.replace(/^\/+|\/+$/g, '')).filter(Boolean).join('/')}`;
}

/** Every route of the application, read from Nest's own route table (controllers and their metadata). */
export function discoverRoutes(app: INestApplication): DiscoveredRoute[] {
  const discovery = new DiscoveryService(app.get(ModulesContainer));
  const scanner = new MetadataScanner();
  const reflector = new Reflector();
  const routes: DiscoveredRoute[] = [];
  for (const wrapper of discovery.getControllers()) {
    const { instance, metatype } = wrapper;
    if (!instance || !metatype) continue;
    const prefixes = ([] as string[]).concat(Reflect.getMetadata(PATH_METADATA, metatype) ?? '');
    const proto = Object.getPrototypeOf(instance) as Record<string, unknown>;
    for (const name of scanner.getAllMethodNames(proto)) {
      const handler = proto[name] as (...args: unknown[]) => unknown;
      const paths = Reflect.getMetadata(PATH_METADATA, handler) as string | string[] | undefined;
      const method = Reflect.getMetadata(METHOD_METADATA, handler) as RequestMethod | undefined;
      if (paths === undefined || method === undefined) continue;
      const targets = [handler, metatype];
      for (const prefix of prefixes) {
        for (const p of ([] as string[]).concat(paths)) {
          routes.push({
            method: RequestMethod[method],
            path: joinPath('api', prefix, p),
            isPublic: reflector.getAllAndOverride<boolean>(IS_PUBLIC_KEY, targets) ?? false,
            minimumRole: reflector.getAllAndOverride<Role | undefined>(ROLES_KEY, targets) ?? null,
            shopOwner: reflector.getAllAndOverride<boolean | undefined>(SHOP_OWNER_KEY, targets) ?? false,
          });
        }
      }
    }
  }
  return routes.sort((a, b) => a.path.localeCompare(b.path) || a.method.localeCompare(b.method));
}
