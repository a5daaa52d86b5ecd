import { CreateUsersAndRefreshTokens1796152400000 } from './1796152400000-CreateUsersAndRefreshTokens';

/** Every committed migration, oldest first (listed, not globbed, so sources and dist behave the same). */
export const MIGRATIONS = [CreateUsersAndRefreshTokens1796152400000];
