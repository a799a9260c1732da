import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { DEFAULT_TIME_ZONE, type InspectionListItem, type InspectionPage } from '@yardcall/shared';
import { DataSource, Repository, type SelectQueryBuilder } from 'typeorm';
import type { AuthUser } from '../auth/auth-user';
import { ApiValidationException } from '../common/api-validation.exception';
import { Organization } from '../organizations/entities/organization.entity';
import { decodeCursor, encodeCursor } from './cursor';
import { PAGE_LIMIT_DEFAULT, type ListInspectionsQuery } from './dto/inspection.dto';
import { Inspection } from './entities/inspection.entity';
import { toListItem } from './inspection-view';

const EXPORT_PAGE = 500;
const BARE_DATE = /^\d{4}-\d{2}-\d{2}$/;

// A bare date is a day of the organisation's time zone: `from` its start, `to` the end of it (the next
// day's start, exclusive). PostgreSQL works out the day's edges, daylight saving time included.
function whereStartedWithin(
  builder: SelectQueryBuilder<Inspection>,
  bound: 'from' | 'to',
  text: string,
  timeZone: string,
): void {
  const operator = bound === 'from' ? '>=' : '<';
  if (BARE_DATE.test(text)) {
    const day = bound === 'from' ? `:${bound}Day::date` : `(:${bound}Day::date + 1)`;
    builder.andWhere(`inspection.started_at ${operator} (${day})::timestamp AT TIME ZONE :dayZone`, {
      [`${bound}Day`]: text,
      dayZone: timeZone,
    });
    return;
  }
  const date = new Date(text);
  if (Number.isNaN(date.getTime())) {
    throw new ApiValidationException([{ field: bound, message: `${text} is not a day or time this list knows.` }]);
  }
  builder.andWhere(`inspection.started_at ${operator} :${bound}`, { [bound]: date });
}

// The list of inspections and its CSV export: filters, sort and keyset cursors.
@Injectable()
export class InspectionListService {
  constructor(
    @InjectRepository(Inspection) private readonly inspections: Repository<Inspection>,
    private readonly dataSource: DataSource,
  ) {}

  async list(user: AuthUser, query: ListInspectionsQuery): Promise<InspectionPage> {
    return this.page(user, query, query.limit ?? PAGE_LIMIT_DEFAULT);
  }

  // Every row the filters select, page after page (the CSV export), up to `max` rows.
  async *listAll(user: AuthUser, query: ListInspectionsQuery, max: number): AsyncGenerator<InspectionListItem[]> {
    let cursor = query.cursor;
    let left = max;
    while (left > 0) {
      const page = await this.page(user, { ...query, cursor }, Math.min(EXPORT_PAGE, left));
      if (page.items.length > 0) yield page.items;
      left -= page.items.length;
      if (!page.nextCursor) return;
      cursor = page.nextCursor;
    }
  }

  // Keyset pages: (sort time, id) after the cursor, backed by the (organization_id, time DESC, id DESC)
  // indexes (read backwards for asc). The driver's name comes from a join on the primary key.
  private async page(user: AuthUser, query: ListInspectionsQuery, limit: number): Promise<InspectionPage> {
    const sort = query.sort ?? 'startedAt';
    const order = query.order ?? 'desc';
    const column = sort === 'submittedAt' ? 'inspection.submitted_at' : 'inspection.started_at';
    const builder = this.inspections
      .createQueryBuilder('inspection')
      .innerJoin('inspection.driver', 'driver')
      .addSelect(['driver.id', 'driver.name'])
      .where('inspection.organization_id = :organizationId', { organizationId: user.organizationId });
    // Drivers see their own walk-arounds; trainers their students' practice ones; the shop and the office all.
    if (user.role === 'driver') builder.andWhere('inspection.driver_id = :self', { self: user.id });
    if (user.role === 'trainer') builder.andWhere("inspection.kind = 'practice'");
    if (sort === 'submittedAt') builder.andWhere('inspection.submitted_at IS NOT NULL');
    if (query.driverId) builder.andWhere('inspection.driver_id = :driverId', { driverId: query.driverId });
    if (query.kind) builder.andWhere('inspection.kind = :kind', { kind: query.kind });
    if (query.status) builder.andWhere('inspection.status = :status', { status: query.status });
    if (query.from || query.to) {
      const timeZone = await this.timeZoneOf(user.organizationId);
      if (query.from) whereStartedWithin(builder, 'from', query.from, timeZone);
      if (query.to) whereStartedWithin(builder, 'to', query.to, timeZone);
    }
    // Written as the partial indexes' predicates, so the planner can use them.
    if (query.hasDefects !== undefined) {
      builder.andWhere(query.hasDefects ? 'inspection.defect_count > 0' : 'inspection.defect_count = 0');
    }
    if (query.rushed !== undefined) builder.andWhere(query.rushed ? 'inspection.rushed' : 'NOT inspection.rushed');
    if (query.vehicleId) {
      builder.andWhere(
        'EXISTS (SELECT 1 FROM inspection_vehicles iv WHERE iv.inspection_id = inspection.id AND iv.vehicle_id = :vehicleId)',
        { vehicleId: query.vehicleId },
      );
    }
    if (query.cursor) {
      const cursor = decodeCursor(query.cursor, sort, order);
      builder.andWhere(`(${column}, inspection.id) ${order === 'desc' ? '<' : '>'} (:cursorAt, :cursorId)`, {
        cursorAt: cursor.at,
        cursorId: cursor.id,
      });
    }
    const direction = order === 'desc' ? 'DESC' : 'ASC';
    const { entities: rows, raw } = await builder
      // The sort time to the microsecond, for the next cursor.
      .addSelect(`to_char(${column} AT TIME ZONE 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.US"Z"')`, 'cursor_at')
      .orderBy(column, direction)
      .addOrderBy('inspection.id', direction)
      .limit(limit + 1)
      .getRawAndEntities<{ cursor_at: string; inspection_id: string }>();
    const page = rows.slice(0, limit);
    const last = page[page.length - 1];
    const lastAt = last ? raw.find((r) => r.inspection_id === last.id)?.cursor_at : undefined;
    return {
      items: page.map((i) => toListItem(i, i.driver?.name ?? '')),
      nextCursor: rows.length > limit && last && lastAt ? encodeCursor({ sort, order, at: lastAt, id: last.id }) : null,
    };
  }

  private async timeZoneOf(organizationId: string): Promise<string> {
    const organization = await this.dataSource.manager.findOne(Organization, {
      select: { id: true, timeZone: true },
      where: { id: organizationId },
    });
    return organization?.timeZone ?? DEFAULT_TIME_ZONE;
  }
}
