import type { LoginLimiter } from '../auth/loginLimiter';
import { createAuthService } from './authService';
import type { ServiceDeps } from './deps';
import { createInvitationService } from './invitationService';
import { createPressService } from './pressService';
import { createUserService } from './userService';

export function createServices(deps: ServiceDeps, limiter: LoginLimiter) {
  return {
    auth: createAuthService(deps, limiter),
    users: createUserService(deps),
    invitations: createInvitationService(deps),
    presses: createPressService(deps),
  };
}

export type Services = ReturnType<typeof createServices>;
