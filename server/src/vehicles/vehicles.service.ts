import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { validateVehicle, type VehicleConfig, type VehicleResponse } from '@yardcall/shared';
import { Repository, type EntityManager } from 'typeorm';
import { ApiValidationException } from '../common/api-validation.exception';
import { isUniqueViolation } from '../common/database-errors';
import { Defect } from '../defects/entities/defect.entity';
import { holdReason } from '../defects/vehicle-status';
import type { CreateVehicleDto, ListVehiclesQuery, UpdateVehicleDto } from './dto/vehicle.dto';
import { Vehicle } from './entities/vehicle.entity';

const UNIT_NUMBER_INDEX = 'UQ_vehicles_org_unit_number_lower';
const NOT_FOUND = 'No vehicle with this id in your organisation.';

function toResponse(vehicle: Vehicle): VehicleResponse {
  return {
    id: vehicle.id,
    unitNumber: vehicle.unitNumber,
    kind: vehicle.kind,
    vin: vehicle.vin,
    plate: vehicle.plate,
    status: vehicle.status,
    statusReason: vehicle.statusReason,
    statusSince: vehicle.statusSince.toISOString(),
    config: vehicle.config,
    createdAt: vehicle.createdAt.toISOString(),
    updatedAt: vehicle.updatedAt.toISOString(),
  };
}

// LIKE treats % and _ as wildcards; a unit number search means the literal text.
function escapeLike(text: string): string {
  return text.replace(/[\\%_]/g, (c) => `\\${c}`);
}

const REASON_NEEDED = new ApiValidationException([
  {
    field: 'statusReason',
    message: 'Say why the unit is out of service, e.g. "Annual inspection due": the fleet board shows it.',
  },
]);

function openSafetyDefects(manager: EntityManager, vehicleId: string): Promise<Defect[]> {
  return manager.find(Defect, {
    select: { id: true, title: true, positionLabel: true },
    where: { vehicleId, status: 'open', safety: true },
    order: { createdAt: 'ASC', id: 'ASC' },
  });
}

interface VehicleFields {
  unitNumber: string;
  kind: Vehicle['kind'];
  vin: string;
  plate: string;
  config: VehicleConfig;
}

@Injectable()
export class VehiclesService {
  constructor(@InjectRepository(Vehicle) private readonly vehicles: Repository<Vehicle>) {}

  async list(organizationId: string, query: ListVehiclesQuery): Promise<VehicleResponse[]> {
    const builder = this.vehicles
      .createQueryBuilder('vehicle')
      .where('vehicle.organization_id = :organizationId', { organizationId })
      .orderBy('vehicle.unit_number', 'ASC');
    if (query.q?.trim()) {
      builder.andWhere("lower(vehicle.unit_number) LIKE :prefix ESCAPE '\\'", {
        prefix: `${escapeLike(query.q.trim().toLowerCase())}%`,
      });
    }
    if (query.kind) builder.andWhere('vehicle.kind = :kind', { kind: query.kind });
    return (await builder.getMany()).map(toResponse);
  }

  async get(organizationId: string, id: string): Promise<VehicleResponse> {
    return toResponse(await this.find(organizationId, id));
  }

  async create(organizationId: string, dto: CreateVehicleDto): Promise<VehicleResponse> {
    const fields = this.normalized(dto);
    this.assertValid(fields);
    const held = dto.status === 'out_of_service';
    const reason = dto.statusReason?.trim() || null;
    if (held && !reason) throw REASON_NEEDED;
    const vehicle = this.vehicles.create({
      organizationId,
      ...fields,
      status: held ? 'out_of_service' : 'in_service',
      statusReason: held ? reason : null,
      manualHoldReason: held ? reason : null,
      statusSince: new Date(),
    });
    return toResponse(await this.save(this.vehicles.manager, vehicle));
  }

  // Only a repair certification (or "no repair needed") lifts the hold of an open safety defect
  // (49 CFR 396.11(a)(3)): putting such a unit back in service by hand is refused. A supervisor or
  // admin may take a unit out of service by hand, with a reason, and lift that hold of their own.
  async update(organizationId: string, id: string, dto: UpdateVehicleDto): Promise<VehicleResponse> {
    return this.vehicles.manager.transaction(async (manager) => {
      const vehicle = await manager.findOne(Vehicle, {
        where: { id, organizationId },
        lock: { mode: 'pessimistic_write' },
      });
      if (!vehicle) throw new NotFoundException(NOT_FOUND);
      const fields = this.normalized({
        unitNumber: dto.unitNumber ?? vehicle.unitNumber,
        kind: dto.kind ?? vehicle.kind,
        vin: dto.vin ?? vehicle.vin,
        plate: dto.plate ?? vehicle.plate,
        config: dto.config ?? vehicle.config,
      });
      // The whole vehicle is re-checked: changing the kind can make the stored axles wrong.
      this.assertValid(fields);
      Object.assign(vehicle, fields);
      const open = await openSafetyDefects(manager, vehicle.id);
      if (dto.status === 'in_service') {
        if (open.length > 0) {
          throw new ConflictException(
            `Unit ${vehicle.unitNumber} stays out of service: it has ${open.length} open safety defect${open.length > 1 ? 's' : ''} (${open
              .map((d) => `${d.title}, ${d.positionLabel}`)
              .join(
                '; ',
              )}). Only a mechanic's repair certification, or their word that no repair is needed, returns it to service (49 CFR 396.11(a)(3)).`,
          );
        }
        vehicle.manualHoldReason = null;
      } else if (dto.status === 'out_of_service' || (dto.statusReason !== undefined && vehicle.manualHoldReason)) {
        const reason = dto.statusReason === undefined ? vehicle.manualHoldReason : dto.statusReason?.trim() || null;
        if (!reason) throw REASON_NEEDED;
        vehicle.manualHoldReason = reason;
      }
      const reason = holdReason(vehicle.manualHoldReason, open);
      const status = reason ? 'out_of_service' : 'in_service';
      if (status !== vehicle.status) {
        vehicle.status = status;
        vehicle.statusSince = new Date();
      }
      vehicle.statusReason = reason;
      return toResponse(await this.save(manager, vehicle));
    });
  }

  private async find(organizationId: string, id: string): Promise<Vehicle> {
    // Scoped to the caller's organisation: another organisation's vehicle answers as if it did not exist.
    const vehicle = await this.vehicles.findOneBy({ id, organizationId });
    if (!vehicle) throw new NotFoundException(NOT_FOUND);
    return vehicle;
  }

  private normalized(input: VehicleFields): VehicleFields {
    return {
      ...input,
      unitNumber: typeof input.unitNumber === 'string' ? input.unitNumber.trim() : input.unitNumber,
      vin: typeof input.vin === 'string' ? input.vin.trim().toUpperCase() : input.vin,
      plate: typeof input.plate === 'string' ? input.plate.trim().toUpperCase() : input.plate,
    };
  }

  private assertValid(fields: VehicleFields): void {
    const problems = validateVehicle(fields);
    if (problems.length > 0) throw new ApiValidationException(problems);
  }

  private async save(manager: EntityManager, vehicle: Vehicle): Promise<Vehicle> {
    try {
      return await manager.save(Vehicle, vehicle);
    } catch (error) {
      if (isUniqueViolation(error, UNIT_NUMBER_INDEX)) {
        throw new ConflictException(
          `Your organisation already has a unit ${vehicle.unitNumber}: choose another unit number.`,
        );
      }
      throw error;
    }
  }
}
