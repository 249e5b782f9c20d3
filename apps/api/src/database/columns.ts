import { Column, type ColumnOptions } from 'typeorm';

// Instants are kept as UTC with millisecond precision; the explicit default keeps
// TypeORM's schema diff in step with what MariaDB reports (CURRENT_TIMESTAMP(3)).
export const InstantColumn = (options: ColumnOptions = {}) => Column({ type: 'datetime', precision: 3, ...options });

export const CreatedAtColumn = () =>
  Column({ type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)', name: 'created_at' });

export const UpdatedAtColumn = () =>
  Column({
    type: 'datetime',
    precision: 3,
    default: () => 'CURRENT_TIMESTAMP(3)',
    onUpdate: 'CURRENT_TIMESTAMP(3)',
    name: 'updated_at',
  });
