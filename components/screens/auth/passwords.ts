/** Message beside a "password again" field when the two entries differ (checked here, never sent). */
export const MISMATCH = 'Does not match the password above';
