import type { Car, CarCreate, Garage } from '../../shared/types/setups';
import { carCreateSchema, carUpdateSchema } from '../../shared/types/setups';
import type { Database } from '../db/database';
import { ApiError } from '../errors';
import type { Car as CarModel } from '../models/Car';
import { toSetupSummary } from './setupDto';

function toCar(car: CarModel): Car {
  const kit = car.kit!;
  return {
    id: car.id,
    nickname: car.nickname,
    kitId: car.kitId,
    kitName: kit.name,
    makerName: kit.maker?.name ?? '',
    vehicleClass: kit.vehicleClass,
    stock: car.stock,
    photoUrl: null,
    createdAt: car.createdAt.toISOString(),
  };
}

function kitInclude(db: Database) {
  return { model: db.models.Kit, as: 'kit', include: [{ model: db.models.Maker, as: 'maker' }] };
}

/** Loads one of the racer's own cars; anyone else's is 404, as if it did not exist. */
export async function findOwnCar(db: Database, ownerId: number, carId: number): Promise<CarModel> {
  const car = Number.isSafeInteger(carId) ? await db.models.Car.findOne({ where: { id: carId, ownerId }, include: [kitInclude(db)] }) : null;
  if (!car) throw ApiError.notFound('That car');
  return car;
}

/** The racer's cars, newest first, each with its setups (most recently changed first). */
export async function getGarage(db: Database, ownerId: number): Promise<Garage> {
  const cars = await db.models.Car.findAll({ where: { ownerId }, include: [kitInclude(db)], order: [['createdAt', 'DESC'], ['id', 'DESC']] });
  const setups = await db.models.Setup.findAll({
    where: { ownerId, deletedAt: null },
    order: [['updatedAt', 'DESC'], ['id', 'DESC']],
  });
  return {
    cars: cars.map((car) => ({ ...toCar(car), setups: setups.filter((s) => s.carId === car.id).map(toSetupSummary) })),
  };
}

export async function createCar(db: Database, ownerId: number, input: CarCreate): Promise<Car> {
  const data = carCreateSchema.parse(input);
  const kit = await db.models.Kit.findByPk(data.kitId);
  if (!kit) throw ApiError.validation({ kitId: 'Pick a kit from the list.' });
  const car = await db.models.Car.create({ ownerId, kitId: kit.id, nickname: data.nickname, stock: data.stock });
  return toCar(await findOwnCar(db, ownerId, car.id));
}

export async function updateCar(db: Database, ownerId: number, carId: number, input: unknown): Promise<Car> {
  const car = await findOwnCar(db, ownerId, carId);
  await car.update(carUpdateSchema.parse(input));
  return toCar(car);
}

/** Removes a car that has no setups left; a car with setups keeps their history and is refused. */
export async function deleteCar(db: Database, ownerId: number, carId: number): Promise<void> {
  const car = await findOwnCar(db, ownerId, carId);
  const setups = await db.models.Setup.count({ where: { carId: car.id, deletedAt: null } });
  if (setups > 0) throw new ApiError(409, 'car_has_setups', `This car still has ${setups} setup${setups === 1 ? '' : 's'}; delete or move them first.`);
  const deletedSetups = await db.models.Setup.count({ where: { carId: car.id } });
  if (deletedSetups > 0) throw new ApiError(409, 'car_has_history', 'This car has deleted setups whose history is kept, so it stays in your garage.');
  await car.destroy();
}
