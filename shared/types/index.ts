export * from './errors';
export * from './health';
export * from './vehicleClasses';
export * from './trackTypes';
export * from './catalog';
export * from './auth';
