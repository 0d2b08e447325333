import { ApiProperty } from '@nestjs/swagger';
import { IsIn } from 'class-validator';

/** A shop owner invites technicians and contributors; higher roles are an admin's decision. */
export const INVITABLE_ROLES = ['technician', 'contributor'] as const;

export class CreateInviteDto {
  @ApiProperty({ enum: INVITABLE_ROLES })
  @IsIn(INVITABLE_ROLES, { message: `must be one of ${INVITABLE_ROLES.join(', ')}` })
  role: (typeof INVITABLE_ROLES)[number];
}
