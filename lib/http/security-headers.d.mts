// Types of security-headers.mjs (plain JavaScript, so that next.config.mjs can load it).
export type Header = { key: string; value: string };
export declare const COMMON_HEADERS: Header[];
export declare const API_POLICY: string;
export declare function pagePolicy(nonce: string, development: boolean): string;
export declare function newNonce(): string;
