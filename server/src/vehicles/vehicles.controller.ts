import { Body, Get, Patch, Post, Query } from '@nestjs/common';
import { ApiCreatedResponse, ApiOkResponse, ApiOperation } from '@nestjs/swagger';
import type { VehicleResponse } from '@yardcall/shared';
import { ApiErrors, SignedInController } from '../common/api-docs';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../auth/decorators/current-user.decorator';
import { Roles } from '../auth/decorators/roles.decorator';
import { UuidParam } from '../common/uuid-param';
import { CreateVehicleDto, ListVehiclesQuery, UpdateVehicleDto, VehicleResponseDto } from './dto/vehicle.dto';
import { VehiclesService } from './vehicles.service';

@SignedInController('vehicles')
export class VehiclesController {
  constructor(private readonly vehicles: VehiclesService) {}

  @Get()
  @ApiOperation({ summary: "The organisation's vehicles; ?q= searches unit numbers by prefix, ?kind= filters." })
  @ApiOkResponse({ type: [VehicleResponseDto] })
  list(@CurrentUser() user: AuthUser, @Query() query: ListVehiclesQuery): Promise<VehicleResponse[]> {
    return this.vehicles.list(user.organizationId, query);
  }

  @Get(':id')
  @ApiOperation({ summary: 'One vehicle with its configuration.' })
  @ApiOkResponse({ type: VehicleResponseDto })
  @ApiErrors({ notFound: true })
  get(@CurrentUser() user: AuthUser, @UuidParam('id') id: string): Promise<VehicleResponse> {
    return this.vehicles.get(user.organizationId, id);
  }

  @Post()
  @Roles('admin', 'supervisor')
  @ApiOperation({ summary: 'Add a vehicle; its configuration is checked by the shared vehicle rules.' })
  @ApiCreatedResponse({ type: VehicleResponseDto })
  @ApiErrors({ badRequest: 'Each wrong field is named in `fields`.', conflict: 'The unit number is taken.' })
  create(@CurrentUser() user: AuthUser, @Body() body: CreateVehicleDto): Promise<VehicleResponse> {
    return this.vehicles.create(user.organizationId, body);
  }

  @Patch(':id')
  @Roles('admin', 'supervisor')
  @ApiOperation({ summary: 'Change a vehicle; a config sent replaces the whole configuration.' })
  @ApiOkResponse({ type: VehicleResponseDto })
  @ApiErrors({ badRequest: true, notFound: true, conflict: true })
  update(
    @CurrentUser() user: AuthUser,
    @UuidParam('id') id: string,
    @Body() body: UpdateVehicleDto,
  ): Promise<VehicleResponse> {
    return this.vehicles.update(user.organizationId, id, body);
  }
}
