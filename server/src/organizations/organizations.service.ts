import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { OrganizationSummary } from '@yardcall/shared';
import { Repository } from 'typeorm';
import { Organization } from './entities/organization.entity';

@Injectable()
export class OrganizationsService {
  constructor(@InjectRepository(Organization) private readonly organizations: Repository<Organization>) {}

  async summary(organizationId: string): Promise<OrganizationSummary> {
    const organization = await this.organizations.findOneBy({ id: organizationId });
    if (!organization) throw new NotFoundException('Your organisation was not found.');
    return { id: organization.id, name: organization.name };
  }
}
