// Every table of the product, split by domain; drizzle-kit reads this file.
export * from './audit';
export * from './auth';
export * from './library';
export * from './baths';
export * from './safety';
