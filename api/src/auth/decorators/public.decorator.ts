import { SetMetadata } from '@nestjs/common';

export const IS_PUBLIC_KEY = 'nappe:isPublic';

/** Opens a route to everyone. Every route must carry either this or `@Roles(...)`. */
export const Public = (): MethodDecorator & ClassDecorator => SetMetadata(IS_PUBLIC_KEY, true);
