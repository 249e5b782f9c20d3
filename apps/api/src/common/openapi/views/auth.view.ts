import { type AcceptedResponse, ROLES, type Role, type SessionResponse, type SessionUser } from '@catline/contracts';
import { ApiProperty, ApiSchema } from '@nestjs/swagger';
import { EnumProperty, IdProperty, InstantProperty } from './fields.js';

@ApiSchema({ name: 'SessionUser', description: 'The signed-in person.' })
export class SessionUserDto implements SessionUser {
  @IdProperty()
  id: number;

  @ApiProperty({ format: 'email' })
  email: string;

  @ApiProperty()
  name: string;

  @EnumProperty(ROLES, 'Role')
  role: Role;

  @IdProperty({ nullable: true, description: 'Set for a catapult officer: the catapult they run now.' })
  catapultId: number | null;
}

@ApiSchema({
  name: 'SessionResponse',
  description:
    'A session: the access token for `Authorization: Bearer`; the refresh token is set as an httpOnly cookie.',
})
export class SessionResponseDto implements SessionResponse {
  @ApiProperty({ description: 'A JWT valid for at most 15 minutes.' })
  accessToken: string;

  @InstantProperty({ description: 'When the access token expires.' })
  expiresAt: string;

  @ApiProperty({ type: () => SessionUserDto })
  user: SessionUser;
}

@ApiSchema({ name: 'AcceptedResponse', description: 'An accepted request whose effect follows later.' })
export class AcceptedResponseDto implements AcceptedResponse {
  @ApiProperty()
  message: string;
}
