import { AuthSession } from '../auth/entities/auth-session.entity.js';
import { kitchenEntities } from '../kitchen/entities/kitchen-entities.js';
import { StudioSettings } from '../studio/entities/studio-settings.entity.js';
import { User } from '../users/entities/user.entity.js';

/** Every entity, listed once for the app module, the CLI data source and the tests. */
export const entities = [User, AuthSession, StudioSettings, ...kitchenEntities];
