export function resolveClientAddress(peer: string | undefined, forwardedFor: string | string[] | undefined, trustedHops: number): string;
