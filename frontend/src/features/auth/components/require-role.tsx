import { Result } from 'antd';
import type { ReactNode } from 'react';
import { Link, Outlet } from 'react-router-dom';
import { paths } from '@/config/paths';
import { canAccess, type Access } from '@/lib/authorization';
import { useCurrentUser } from '@/lib/current-user';

type RequireRoleProps = {
  /** At least this role (technician < contributor < moderator < admin) and/or shop ownership. */
  access: Access;
  children?: ReactNode;
};

/** Shows its routes only to users the `access` rule lets in; the server checks again on every call. */
export function RequireRole({ access, children }: RequireRoleProps) {
  const user = useCurrentUser();
  if (!canAccess(user, access)) {
    return (
      <Result
        status="403"
        title="This page is not open to your account"
        subTitle={
          access.shopOwner
            ? 'Only the owner of the shop can use it.'
            : 'Your role does not include it. An administrator can change your role.'
        }
        extra={<Link to={paths.home}>Back to the home page</Link>}
      />
    );
  }
  return <>{children ?? <Outlet />}</>;
}
