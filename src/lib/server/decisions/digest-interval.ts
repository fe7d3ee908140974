/**
 * How often the server process sends the decision digest (docs/decisions.md, "The digest"):
 * STEAMWISP_DIGEST_MINUTES, whole minutes from 1 to 1440 (a day); 0 or "off": never (another
 * process, or nobody, sends it); unset: every 10 minutes. No framework import: pure.
 */
export const DEFAULT_DIGEST_MINUTES = 10;

export function digestMinutes(env: Record<string, string | undefined>): number | null {
	const raw = env.STEAMWISP_DIGEST_MINUTES?.trim();
	if (raw === undefined || raw === '') return DEFAULT_DIGEST_MINUTES;
	if (/^(0|off)$/i.test(raw)) return null;
	const minutes = Number(raw);
	if (!Number.isInteger(minutes) || minutes < 1 || minutes > 1440) {
		throw new Error(
			`STEAMWISP_DIGEST_MINUTES must be whole minutes from 1 to 1440, or 0 / off, got "${raw}"`
		);
	}
	return minutes;
}
