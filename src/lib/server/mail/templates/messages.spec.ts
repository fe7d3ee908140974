import { describe, expect, it } from 'vitest';
import { invitationMessage, passwordResetMessage } from './messages';
import { escapeHtml } from './render';

describe('account messages', () => {
	const invite = invitationMessage({
		firmName: 'Cinderbrook <Energy> & Partners',
		inviterName: 'Ines "the boss" Okafor',
		role: 'client',
		clientName: 'Larkspindle Dairy',
		url: 'http://127.0.0.1:4180/invitation/abc?x=1&y=2',
		days: 7
	});

	it('carries the link in both bodies', () => {
		expect(invite.text).toContain('http://127.0.0.1:4180/invitation/abc?x=1&y=2');
		expect(invite.html).toContain('href="http://127.0.0.1:4180/invitation/abc?x=1&amp;y=2"');
	});

	it('escapes names in the HTML part', () => {
		expect(invite.html).not.toContain('<Energy>');
		expect(invite.html).toContain('Cinderbrook &lt;Energy&gt; &amp; Partners');
		expect(invite.html).toContain('Ines &quot;the boss&quot; Okafor');
		expect(invite.text).toContain('Cinderbrook <Energy> & Partners');
	});

	it('says the role, the client company and how long the link works', () => {
		expect(invite.text).toContain('as a client user');
		expect(invite.text).toContain('for Larkspindle Dairy');
		expect(invite.text).toContain('for 7 days');
	});

	it('tells the reset recipient the old password still works', () => {
		const m = passwordResetMessage({ name: 'Priya', url: 'http://x/reset/t', minutes: 60 });
		expect(m.subject).toBe('Choose a new Steamwisp password');
		expect(m.text).toContain('Hello Priya,');
		expect(m.text).toContain('keeps working until you do');
		expect(m.text).toContain('60 minutes');
	});

	it('escapes every HTML-special character', () => {
		expect(escapeHtml(`<a href='x'>"&"</a>`)).toBe(
			'&lt;a href=&#39;x&#39;&gt;&quot;&amp;&quot;&lt;/a&gt;'
		);
	});
});
