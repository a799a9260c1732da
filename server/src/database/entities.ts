import { Organization } from '../organizations/entities/organization.entity';
import { Invitation } from '../users/entities/invitation.entity';
import { User } from '../users/entities/user.entity';
import { Vehicle } from '../vehicles/entities/vehicle.entity';

// Every entity, passed as classes (globs fail under Jest and after bundling).
export const ENTITIES = [Organization, User, Invitation, Vehicle];
