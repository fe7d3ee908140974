/** The built app as the benchmarks start it: waits until it answers its health route. */
export async function waitForApp(origin: string): Promise<void> {
	for (let i = 0; i < 100; i++) {
		try {
			if ((await fetch(`${origin}/api/health`)).ok) return;
		} catch {
			// not listening yet
		}
		await new Promise((r) => setTimeout(r, 200));
	}
	throw new Error('The built app did not start');
}
