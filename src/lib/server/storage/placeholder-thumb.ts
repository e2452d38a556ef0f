// The thumbnail shown for a photo this server cannot decode (HEIC): our own plain tile that says
// so, instead of a broken image. Fixed text, no script, no outside font or link.

const SVG = `<svg xmlns="http://www.w3.org/2000/svg" width="480" height="360" viewBox="0 0 480 360" role="img" aria-label="HEIC photo: no preview here, open to view">
<rect width="480" height="360" fill="#f7f5f0"/>
<rect x="6" y="6" width="468" height="348" fill="none" stroke="#454a52" stroke-width="4" stroke-dasharray="18 10"/>
<g fill="none" stroke="#0e4a5a" stroke-width="8" stroke-linejoin="round">
<rect x="190" y="70" width="100" height="76" rx="8"/>
<circle cx="240" cy="108" r="22"/>
</g>
<text x="240" y="216" text-anchor="middle" font-family="system-ui, sans-serif" font-size="44" font-weight="800" fill="#15171b">HEIC</text>
<text x="240" y="270" text-anchor="middle" font-family="system-ui, sans-serif" font-size="30" font-weight="600" fill="#15171b">No preview here</text>
<text x="240" y="312" text-anchor="middle" font-family="system-ui, sans-serif" font-size="26" fill="#454a52">open to view</text>
</svg>
`;

/** The placeholder tile's bytes and type. */
export const PLACEHOLDER_THUMB = { bytes: new TextEncoder().encode(SVG), mimeType: 'image/svg+xml' } as const;
