export function satisfiesNodeRange(version: string, range: string): boolean;
export function declaredNodeRange(packageJsonPath?: URL | string): string;
export function checkNode(): void;
