/**
 * How Debian's Chromium is started for the browser tests and the Walk benchmark: the packaged
 * browser (never a downloaded one), as root without its sandbox, and with the background
 * networking a closed machine refuses switched off.
 */
export const chromiumLaunchOptions = {
	executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
	args: [
		'--no-sandbox',
		'--disable-gpu',
		'--disable-dev-shm-usage',
		'--disable-quic',
		'--no-first-run',
		'--disable-background-networking',
		'--disable-component-update',
		'--disable-sync'
	]
};
