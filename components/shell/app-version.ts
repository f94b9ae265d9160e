import Constants from 'expo-constants';

/** Version of this client build, from app config; shown so support can tell builds apart. */
export const APP_VERSION: string = Constants.expoConfig?.version ?? '0.1.0';
