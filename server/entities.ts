import { CompanyEntity } from './modules/companies/company.entity'
import { UserEntity } from './modules/users/user.entity'
import { UserTokenEntity } from './modules/auth/user-token.entity'
import { SiteEntity } from './modules/sites/site.entity'
import { SitePhotoEntity } from './modules/sites/site-photo.entity'

/** Every entity class, listed (no globs: esbuild-built code has no stable file layout). */
export const entities = [CompanyEntity, UserEntity, UserTokenEntity, SiteEntity, SitePhotoEntity]
