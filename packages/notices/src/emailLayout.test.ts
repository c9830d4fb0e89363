import { describe, expect, it } from 'vitest';
import { emailLayout } from './emailLayout';

describe('emailLayout', () => {
  const parts = emailLayout({
    subject: 'Bids are in',
    greeting: 'Hello Maya,',
    paragraphs: ['Three bids on <Tuck & carton>.'],
    action: { label: 'Compare', url: 'http://127.0.0.1:4100/requests/1?x=1&y=2' },
    footer: 'Footer',
  });

  it('has a plain-text part with the link back', () => {
    expect(parts.text).toContain('Three bids on <Tuck & carton>.');
    expect(parts.text).toContain('Compare: http://127.0.0.1:4100/requests/1?x=1&y=2');
  });

  // HTML escaping of the five XML special characters (HTML Living Standard, "escaping a string").
  it('escapes what it puts in the HTML part', () => {
    expect(parts.html).toContain('Three bids on &lt;Tuck &amp; carton&gt;.');
    expect(parts.html).toContain('href="http://127.0.0.1:4100/requests/1?x=1&amp;y=2"');
    expect(parts.html).not.toContain('<Tuck');
  });
});
