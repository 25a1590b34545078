import type { UseQueryResult } from '@tanstack/react-query';
import { router } from 'expo-router';
import type { ReactElement } from 'react';
import type { Garage } from '../shared/types/setups';
import { EmptyState, ErrorState, LoadingState } from './StatusViews';

export type CarsRequiredProps = {
  garage: UseQueryResult<Garage>;
  /** What the empty state says when the racer has no car yet. */
  emptyTitle: string;
  emptyMessage: string;
  children: (cars: Garage['cars']) => ReactElement;
};

/** Loading, error and "add a car first" states for screens that act on one of the racer's cars. */
export function CarsRequired({ garage, emptyTitle, emptyMessage, children }: CarsRequiredProps) {
  if (garage.isPending) return <LoadingState label="Loading your cars…" />;
  if (garage.isError) {
    return <ErrorState title="Your cars could not load" message={garage.error.message} onRetry={() => void garage.refetch()} />;
  }
  if (garage.data.cars.length === 0) {
    return <EmptyState title={emptyTitle} message={emptyMessage} actionLabel="Add a car" onAction={() => router.replace('/garage/add-car')} />;
  }
  return children(garage.data.cars);
}
