import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import {
  READING_RULES,
  canonicalTimeZone,
  type FieldProblem,
  type OrganizationSummary,
  type OrganizationTimeZone,
  type ReadingRule,
} from '@yardcall/shared';
import { Repository } from 'typeorm';
import { ApiValidationException } from '../common/api-validation.exception';
import { Organization } from './entities/organization.entity';

@Injectable()
export class OrganizationsService {
  constructor(@InjectRepository(Organization) private readonly organizations: Repository<Organization>) {}

  async summary(organizationId: string): Promise<OrganizationSummary> {
    const organization = await this.organizations.findOneBy({ id: organizationId });
    if (!organization) throw new NotFoundException('Your organisation was not found.');
    return { id: organization.id, name: organization.name, requiredReadings: organization.requiredReadings };
  }

  // Stored once each, in READING_RULES order; a walk-around already begun keeps the rules it began with.
  async updateRequiredReadings(organizationId: string, sent: readonly string[]): Promise<OrganizationSummary> {
    const known = new Set<string>(READING_RULES);
    const problems: FieldProblem[] = sent.flatMap((rule, index) =>
      known.has(rule)
        ? []
        : [
            {
              field: `requiredReadings.${index}`,
              message: `"${rule}" is not a reading the app knows; choose from: ${READING_RULES.join(', ')}.`,
            },
          ],
    );
    if (problems.length > 0) throw new ApiValidationException(problems);
    const requiredReadings: ReadingRule[] = READING_RULES.filter((rule) => sent.includes(rule));
    const result = await this.organizations.update({ id: organizationId }, { requiredReadings });
    if (!result.affected) throw new NotFoundException('Your organisation was not found.');
    return this.summary(organizationId);
  }

  async timeZone(organizationId: string): Promise<OrganizationTimeZone> {
    const organization = await this.organizations.findOne({
      select: { id: true, timeZone: true },
      where: { id: organizationId },
    });
    if (!organization) throw new NotFoundException('Your organisation was not found.');
    return { timeZone: organization.timeZone };
  }

  async updateTimeZone(organizationId: string, name: string): Promise<OrganizationTimeZone> {
    const timeZone = canonicalTimeZone(name.trim());
    if (!timeZone) {
      throw new ApiValidationException([
        {
          field: 'timeZone',
          message: `"${name}" is not a time zone name this server knows: use an IANA name such as America/Chicago, Europe/Madrid or UTC.`,
        },
      ]);
    }
    const result = await this.organizations.update({ id: organizationId }, { timeZone });
    if (!result.affected) throw new NotFoundException('Your organisation was not found.');
    return { timeZone };
  }
}
