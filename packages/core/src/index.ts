export * from './auth/schemas';
export * from './people/roles';
export * from './people/schemas';
export * from './shop/schemas';
export * from './http/problem';
export * from './csv/csv';
