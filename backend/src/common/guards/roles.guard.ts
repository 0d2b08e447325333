import { CanActivate, ExecutionContext, ForbiddenException, Injectable } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { roleAtLeast, type Role } from '@causeway/shared';
import type { AuthUser } from '../../auth/auth-user';
import { IS_PUBLIC_KEY } from '../decorators/public.decorator';
import { ROLES_KEY, SHOP_OWNER_KEY } from '../decorators/roles.decorator';

@Injectable()
export class RolesGuard implements CanActivate {
  constructor(private readonly reflector: Reflector) {}

  canActivate(context: ExecutionContext): boolean {
    const targets = [context.getHandler(), context.getClass()];
    if (this.reflector.getAllAndOverride<boolean>(IS_PUBLIC_KEY, targets)) return true;
    const user = context.switchToHttp().getRequest<{ user?: AuthUser }>().user;
    if (!user) return false;
    const minimum = this.reflector.getAllAndOverride<Role | undefined>(ROLES_KEY, targets);
    if (minimum && !roleAtLeast(user.role, minimum)) {
      throw new ForbiddenException(`This needs the ${minimum} role or higher`);
    }
    const ownerOnly = this.reflector.getAllAndOverride<boolean | undefined>(SHOP_OWNER_KEY, targets);
    if (ownerOnly && !(user.shopOwner || user.role === 'admin')) {
      throw new ForbiddenException('Only the owner of the shop may do this');
    }
    return true;
  }
}
