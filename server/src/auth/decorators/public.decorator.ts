import { SetMetadata } from '@nestjs/common';

export const IS_PUBLIC_KEY = 'yardcall:isPublic';

// Opens a route to callers without a token; every other route needs one (global JwtAuthGuard).
export const Public = (): MethodDecorator & ClassDecorator => SetMetadata(IS_PUBLIC_KEY, true);
