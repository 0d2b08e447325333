import { BadRequestException, ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { Brackets, QueryFailedError, Repository } from 'typeorm';
import { validateVin, type FieldError, type Page, type VehicleDto, type VinResult } from '@causeway/shared';
import type { AuthUser } from '../auth/auth-user';
import { Job } from '../jobs/entities/job.entity';
import type { Shop } from '../shops/entities/shop.entity';
import { validationFailed } from '../common/validation';
import { ShopsService } from '../shops/shops.service';
import type { CreateVehicleDto, UpdateVehicleDto, VehicleListQuery } from './dto/vehicle.dto';
import { Vehicle } from './entities/vehicle.entity';
import { nextOdometerKm, shownReading } from './odometer';

function likeEscape(s: string): string {
  return s.replace(/[\\%_]/g, (c) => `\\${c}`);
}

/** Validates a VIN or answers 400 naming each position and why (49 CFR 565.15). */
export function vinOr400(input: string, field = 'vin'): VinResult {
  const result = validateVin(input);
  if (!result.valid) {
    const errors = result.issues.filter((i) => i.severity === 'error').map((i) => ({ field, message: i.message }));
    throw new BadRequestException({
      statusCode: 400,
      error: 'Bad Request',
      message: errors.map((e) => `${field}: ${e.message}`).join('; '),
      errors,
      details: { vin: result },
    });
  }
  return result;
}

/** What deserves a second look about a VIN and year without stopping the save. */
export function vehicleWarnings(vin: string, year: number | null): FieldError[] {
  const result = validateVin(vin);
  const warnings: FieldError[] = result.issues.filter((i) => i.severity === 'warning').map((i) => ({ field: 'vin', message: i.message }));
  if (year !== null && result.valid) {
    const fromVin = result.modelYear;
    const disagrees = fromVin !== null ? fromVin !== year : result.modelYearCandidates.length > 0 && !result.modelYearCandidates.includes(year);
    if (disagrees) {
      const meaning = fromVin !== null ? `model year ${fromVin}` : `one of ${result.modelYearCandidates.join(', ')}`;
      warnings.push({ field: 'year', message: `${year} disagrees with VIN position 10 ('${result.vin[9]}'), which gives ${meaning} (49 CFR 565.15)` });
    }
  }
  return warnings;
}

export function toVehicleDto(v: Vehicle, shop: Shop): VehicleDto {
  return {
    id: v.id,
    vin: v.vin,
    make: v.make,
    model: v.model,
    engine: v.engine,
    year: v.year,
    plate: v.plate,
    odometerKm: v.odometerKm,
    odometer: shownReading(v.odometerKm, shop.distanceUnit),
    distanceUnit: shop.distanceUnit,
    ownerName: v.ownerName,
    ownerEmail: v.ownerEmail,
    warnings: vehicleWarnings(v.vin, v.year),
    createdAt: v.createdAt.toISOString(),
    updatedAt: v.updatedAt.toISOString(),
  };
}

function isUniqueViolation(err: unknown): boolean {
  if (!(err instanceof QueryFailedError)) return false;
  const e = err as QueryFailedError & { code?: string; driverError?: { code?: string } };
  return e.driverError?.code === 'SQLITE_CONSTRAINT_UNIQUE' || e.driverError?.code === '23505' || /UNIQUE constraint/i.test(e.message);
}

function vinTaken(existingId: string): ConflictException {
  return new ConflictException({
    statusCode: 409,
    error: 'Conflict',
    message: 'vin: a vehicle of this shop already has this VIN',
    errors: [{ field: 'vin', message: 'is already registered to a vehicle of this shop' }],
    details: { vehicleId: existingId },
  });
}

export const VEHICLE_SORT_COLUMNS: Record<VehicleListQuery['sort'], string> = {
  updatedAt: 'v.updatedAt',
  createdAt: 'v.createdAt',
  vin: 'v.vin',
  make: 'v.make',
  model: 'v.model',
  year: 'v.year',
  plate: 'v.plate',
  ownerName: 'v.ownerName',
};

@Injectable()
export class VehiclesService {
  constructor(
    @InjectRepository(Vehicle) private readonly vehicles: Repository<Vehicle>,
    @InjectRepository(Job) private readonly jobs: Repository<Job>,
    private readonly shops: ShopsService,
  ) {}

  /** A vehicle of the caller's shop; another shop's is a 404, never a 403. */
  async findOwned(shop: Shop, id: string): Promise<Vehicle> {
    const vehicle = /^[0-9a-f-]{36}$/i.test(id) ? await this.vehicles.findOne({ where: { id, shopId: shop.id } }) : null;
    if (!vehicle) throw new NotFoundException('Vehicle not found');
    return vehicle;
  }

  async list(user: AuthUser, q: VehicleListQuery): Promise<Page<VehicleDto>> {
    const shop = await this.shops.shopOf(user);
    const qb = this.vehicles.createQueryBuilder('v').where('v.shopId = :shopId', { shopId: shop.id });
    const text = q.q?.trim();
    if (text) {
      const compact = `%${likeEscape(text.toUpperCase().replace(/[\s-]+/g, ''))}%`;
      const loose = `%${likeEscape(text.toLowerCase())}%`;
      qb.andWhere(
        new Brackets((w) =>
          w
            .where("v.vin LIKE :compact ESCAPE '\\'", { compact })
            .orWhere("REPLACE(REPLACE(UPPER(v.plate), ' ', ''), '-', '') LIKE :compact ESCAPE '\\'")
            .orWhere("LOWER(v.ownerName) LIKE :loose ESCAPE '\\'", { loose })
            .orWhere("LOWER(v.ownerEmail) LIKE :loose ESCAPE '\\'"),
        ),
      );
    }
    // Empty values last in both directions, on SQLite and PostgreSQL alike (their defaults differ).
    qb.orderBy(VEHICLE_SORT_COLUMNS[q.sort], q.order === 'asc' ? 'ASC' : 'DESC', 'NULLS LAST').addOrderBy('v.id', 'ASC');
    qb.skip((q.page - 1) * q.pageSize).take(q.pageSize);
    const [rows, total] = await qb.getManyAndCount();
    return { items: rows.map((v) => toVehicleDto(v, shop)), total, page: q.page, pageSize: q.pageSize };
  }

  async get(user: AuthUser, id: string): Promise<VehicleDto> {
    const shop = await this.shops.shopOf(user);
    return toVehicleDto(await this.findOwned(shop, id), shop);
  }

  async create(user: AuthUser, dto: CreateVehicleDto): Promise<VehicleDto> {
    const shop = await this.shops.shopOf(user);
    const vin = vinOr400(dto.vin);
    const existing = await this.vehicles.findOne({ where: { shopId: shop.id, vin: vin.vin }, select: { id: true } });
    if (existing) throw vinTaken(existing.id);
    const now = new Date();
    const odometerKm = dto.odometer === undefined || dto.odometer === null ? null : nextOdometerKm(null, dto.odometer, shop.distanceUnit, true);
    const vehicle = this.vehicles.create({
      shopId: shop.id,
      vin: vin.vin,
      make: dto.make,
      model: dto.model,
      engine: dto.engine ?? null,
      year: dto.year ?? vin.modelYear,
      plate: dto.plate ?? null,
      odometerKm,
      odometerReadAt: odometerKm === null ? null : now,
      ownerName: dto.ownerName ?? null,
      ownerEmail: dto.ownerEmail ?? null,
    });
    return toVehicleDto(await this.saveUnique(vehicle), shop);
  }

  async update(user: AuthUser, id: string, dto: UpdateVehicleDto): Promise<VehicleDto> {
    const shop = await this.shops.shopOf(user);
    const vehicle = await this.findOwned(shop, id);
    // PartialType lets null through every field; make and model are required, so they cannot be cleared.
    const cleared = (['make', 'model'] as const).filter((k) => dto[k] === null);
    if (cleared.length > 0) throw validationFailed(cleared.map((field) => ({ field, message: 'is required: it cannot be cleared' })));
    if (dto.vin !== undefined) {
      const vin = vinOr400(dto.vin);
      if (vin.vin !== vehicle.vin) {
        const existing = await this.vehicles.findOne({ where: { shopId: shop.id, vin: vin.vin }, select: { id: true } });
        if (existing) throw vinTaken(existing.id);
        vehicle.vin = vin.vin;
        // A new VIN with no year given takes the VIN's year.
        if (dto.year === undefined && vin.modelYear !== null) vehicle.year = vin.modelYear;
      }
    }
    if (dto.odometer !== undefined) {
      if (dto.odometer === null) {
        vehicle.odometerKm = null;
        vehicle.odometerReadAt = null;
      } else {
        const km = nextOdometerKm(vehicle.odometerKm, dto.odometer, shop.distanceUnit, dto.confirmOdometerLower);
        if (km !== vehicle.odometerKm) vehicle.odometerReadAt = new Date();
        vehicle.odometerKm = km;
      }
    }
    for (const key of ['make', 'model', 'engine', 'year', 'plate', 'ownerName', 'ownerEmail'] as const) {
      if (dto[key] !== undefined) (vehicle as unknown as Record<string, unknown>)[key] = dto[key];
    }
    return toVehicleDto(await this.saveUnique(vehicle), shop);
  }

  async remove(user: AuthUser, id: string): Promise<void> {
    const shop = await this.shops.shopOf(user);
    const vehicle = await this.findOwned(shop, id);
    const jobs = await this.jobs.count({ where: { vehicleId: vehicle.id } });
    if (jobs > 0) {
      throw new ConflictException({
        statusCode: 409,
        error: 'Conflict',
        message: `This vehicle has ${jobs} job${jobs === 1 ? '' : 's'}; a vehicle with jobs is kept for their history`,
        details: { jobs },
      });
    }
    await this.vehicles.delete({ id: vehicle.id, shopId: shop.id });
  }

  private async saveUnique(vehicle: Vehicle): Promise<Vehicle> {
    try {
      return await this.vehicles.save(vehicle);
    } catch (err) {
      if (isUniqueViolation(err)) {
        const existing = await this.vehicles.findOne({ where: { shopId: vehicle.shopId, vin: vehicle.vin }, select: { id: true } });
        throw vinTaken(existing?.id ?? '');
      }
      throw err;
    }
  }
}
