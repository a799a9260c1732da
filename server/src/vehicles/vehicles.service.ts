import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { validateVehicle, type VehicleConfig, type VehicleResponse } from '@yardcall/shared';
import { Repository } from 'typeorm';
import { ApiValidationException } from '../common/api-validation.exception';
import { isUniqueViolation } from '../common/database-errors';
import type { CreateVehicleDto, ListVehiclesQuery, UpdateVehicleDto } from './dto/vehicle.dto';
import { Vehicle } from './entities/vehicle.entity';

const UNIT_NUMBER_INDEX = 'UQ_vehicles_org_unit_number_lower';

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
    const status = dto.status ?? 'in_service';
    const vehicle = this.vehicles.create({
      organizationId,
      ...fields,
      status,
      statusReason: status === 'out_of_service' ? dto.statusReason?.trim() || null : null,
      statusSince: new Date(),
    });
    return toResponse(await this.save(vehicle));
  }

  async update(organizationId: string, id: string, dto: UpdateVehicleDto): Promise<VehicleResponse> {
    const vehicle = await this.find(organizationId, id);
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
    if (dto.status !== undefined && dto.status !== vehicle.status) {
      vehicle.status = dto.status;
      vehicle.statusSince = new Date();
    }
    if (vehicle.status === 'in_service') {
      vehicle.statusReason = null;
    } else if (dto.statusReason !== undefined) {
      vehicle.statusReason = dto.statusReason?.trim() || null;
    }
    return toResponse(await this.save(vehicle));
  }

  private async find(organizationId: string, id: string): Promise<Vehicle> {
    // Scoped to the caller's organisation: another organisation's vehicle answers as if it did not exist.
    const vehicle = await this.vehicles.findOneBy({ id, organizationId });
    if (!vehicle) throw new NotFoundException('No vehicle with this id in your organisation.');
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

  private async save(vehicle: Vehicle): Promise<Vehicle> {
    try {
      return await this.vehicles.save(vehicle);
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
