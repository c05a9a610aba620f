export declare const ROOT: string;
export declare function readEnv(base?: Record<string, string | undefined>): Record<string, string>;
export declare function loadEnv(): Record<string, string>;
