// The cut sheet as HTML, for the benchmark's comparison with the browser's own print to PDF.
// Same words, same drawing and guide geometry, same Inter TTF (inlined, as the PDF embeds it).
// The shell (fonts, styles) is opened once; each sheet replaces only the body, as a print service
// keeping a warm page would (re-sending and decoding the inlined fonts took most of each print).
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { renderToStaticMarkup } from 'react-dom/server';
import { checkRuler, guideStrips } from '../src/lib/server/cut-sheet/chalk-guide';
import { sheetContent, type SheetLegGroup } from '../src/lib/server/cut-sheet/content';
import { legGeometry } from '../src/lib/server/cut-sheet/leg-geometry';
import { qrPath } from '../src/lib/server/cut-sheet/qr';
import type { CutSheetData } from '../src/lib/shared/cut-sheet-types';

const CUT = '#b3121b';
const pts = (p: [number, number][]) => p.map(([x, y]) => `${x},${y}`).join(' ');

function fontFaces(): string {
  const dir = dirname(createRequire(import.meta.url).resolve('@expo-google-fonts/inter/package.json'));
  return (
    [
      [400, '400Regular/Inter_400Regular.ttf'],
      [700, '700Bold/Inter_700Bold.ttf'],
      [800, '800ExtraBold/Inter_800ExtraBold.ttf'],
    ] as const
  )
    .map(
      ([w, f]) =>
        `@font-face{font-family:Inter;font-weight:${w};src:url(data:font/ttf;base64,${readFileSync(join(dir, f)).toString('base64')}) format("truetype")}`,
    )
    .join('');
}

function Leg({ g }: { g: SheetLegGroup }) {
  // A kept factory hem has no drawing (this benchmark prints cuffs and hems).
  if (g.leg.finish === 'original') return null;
  const geo = legGeometry(g.leg, 160, 136);
  const cut = g.lines.find((l) => l.cut)!;
  return (
    <section style={{ marginBottom: 6 }}>
      <div>
        <b style={{ fontSize: '8pt', letterSpacing: 1.2, color: '#555', display: 'inline-block', width: 70 }}>{g.label.toUpperCase()}</b>
        <b style={{ fontSize: '12.5pt' }}>{g.title}</b>
      </div>
      <div style={{ display: 'flex' }}>
        <div style={{ flex: 1, marginRight: 8 }}>
          <table style={{ width: '100%', borderCollapse: 'collapse' }}>
            <thead>
              <tr style={{ fontSize: '7.5pt', color: '#555' }}>
                <th align="left">CHALK LINE</th>
                <th align="right">BELOW PIN MARK</th>
                <th align="right">ABOVE RAW EDGE</th>
              </tr>
            </thead>
            <tbody>
              {g.lines
                .filter((l) => !l.cut)
                .map((l) => (
                  <tr key={l.n} style={{ borderBottom: '0.5pt solid #999' }}>
                    <td style={{ fontSize: '10pt' }}>
                      <b>{l.n}</b> {l.name}
                    </td>
                    <td align="right" style={{ fontSize: '14pt', fontWeight: 700 }}>
                      {l.belowMark.text}
                    </td>
                    <td align="right" style={{ fontSize: '14pt', fontWeight: 700 }}>
                      {l.aboveRawEdge?.text ?? '—'}
                    </td>
                  </tr>
                ))}
            </tbody>
          </table>
          <div style={{ border: `2pt solid ${CUT}`, padding: '2pt 6pt', display: 'flex', marginTop: 4 }}>
            <div style={{ marginRight: 6 }}>
              <span style={{ background: '#111', color: '#fff', fontWeight: 800, padding: '0 4pt' }}>CUT</span>
              <div style={{ fontSize: '7.5pt' }}>LINE {cut.n}</div>
            </div>
            <div style={{ color: CUT }}>
              <div>
                <b style={{ fontSize: '22pt', fontWeight: 800 }}>{cut.belowMark.text}</b> <span style={{ fontSize: '8.5pt' }}>below the pin mark</span>
              </div>
              <div>
                <b style={{ fontSize: '22pt', fontWeight: 800 }}>{cut.aboveRawEdge?.text ?? '—'}</b>{' '}
                <span style={{ fontSize: '8.5pt' }}>above the raw edge</span>
              </div>
            </div>
          </div>
        </div>
        <svg width={`${geo.width}pt`} height={`${geo.height}pt`} viewBox={`0 0 ${geo.width} ${geo.height}`}>
          <polygon points={pts(geo.outline)} fill="#f1efe9" stroke="#111" />
          {geo.cutAway.length > 0 && <polygon points={pts(geo.cutAway)} fill="#d9d6cf" />}
          {geo.seams.map((s, i) => (
            <line key={i} {...s} stroke="#111" strokeDasharray="3 2" />
          ))}
          {geo.lines.map((l, i) => (
            <g key={i}>
              <line
                x1={0}
                x2={geo.width - 30}
                y1={l.y}
                y2={l.y}
                stroke={l.cut ? CUT : '#111'}
                strokeWidth={l.cut ? 2.2 : 0.9}
                strokeDasharray={l.cut ? '5 2' : undefined}
              />
              <text x={geo.width - 28} y={l.y + 3} fontSize={8} fontWeight={800} fill={l.cut ? CUT : '#111'}>
                {l.label}
              </text>
            </g>
          ))}
          <text x={0} y={geo.height - 3} fontSize={6.5} fill="#555">
            {geo.caption}
          </text>
        </svg>
      </div>
      <p style={{ margin: '4pt 0 0', fontWeight: 700 }}>{g.cloth.text}</p>
      {g.cloth.options.length > 0 && <p style={{ margin: 0 }}>Instead: {g.cloth.options.join(' ')}</p>}
      {g.slopeNote && <p style={{ margin: 0 }}>{g.slopeNote}</p>}
      {g.taper && <p style={{ margin: 0, fontWeight: 700 }}>{g.taper.summary}</p>}
      {g.taper?.work && <p style={{ margin: 0 }}>{g.taper.work}</p>}
      {g.crease && <p style={{ margin: 0 }}>{g.crease}</p>}
      {g.warnings.map((w, i) => (
        <p key={i} style={{ margin: 0, color: '#8a4b00', fontWeight: 700 }}>
          Check: {w}
        </p>
      ))}
    </section>
  );
}

function Sheet({ data }: { data: CutSheetData }) {
  const c = sheetContent(data);
  const strips = guideStrips(c.groups, data.unit, 792 - 56 - 300);
  const ruler = checkRuler(data.unit);
  const qr = data.link ? qrPath(data.link) : null;
  const w = strips.length > 1 ? 72 : 108;
  return (
    <div className="page">
      <header style={{ display: 'flex', justifyContent: 'space-between', borderBottom: '2pt solid #111', paddingBottom: 6, marginBottom: 8 }}>
        <div>
          <div style={{ fontSize: '8pt', color: '#555' }}>
            <b style={{ letterSpacing: 1.5 }}>CUT SHEET</b> {c.unitNote} Distances are measured down from the pin mark.
          </div>
          <div style={{ fontSize: '17pt', fontWeight: 800 }}>{c.title}</div>
          <div style={{ fontSize: '11pt', fontWeight: 700 }}>{c.meta.join('   ·   ')}</div>
        </div>
        {qr && (
          <svg width="52pt" height="52pt" viewBox={`-2 -2 ${qr.size + 4} ${qr.size + 4}`}>
            <path d={qr.d} fill="#111" />
          </svg>
        )}
      </header>
      <div style={{ display: 'flex' }}>
        <main style={{ flex: 1, paddingRight: 12 }}>
          {c.groups.map((g, i) => (
            <Leg key={i} g={g} />
          ))}
          <h2>AT THE BENCH, IN THIS ORDER</h2>
          {c.steps.map((b, i) => (
            <ol key={i}>
              {b.items.map((t, j) => (
                <li key={j}>{t}</li>
              ))}
            </ol>
          ))}
          <h2>MIND YOUR HANDS</h2>
          <ul style={{ fontSize: '7.5pt' }}>
            {c.cautions.map((t, i) => (
              <li key={i}>{t}</li>
            ))}
          </ul>
        </main>
        <aside style={{ width: '162pt', borderLeft: '0.75pt solid #999', paddingLeft: 8 }}>
          <h2>CHALK GUIDE 1:1</h2>
          <svg width={`${ruler.length + 8}pt`} height="26pt" viewBox={`0 0 ${ruler.length + 8} 26`} style={{ display: 'block', background: '#f1efe9' }}>
            <path d={`M0 0.3h${ruler.length + 8}`} stroke="#111" strokeWidth={0.6} />
            <path d={ruler.ticks.map((t) => `M${t.x + 4} 0v${t.len}`).join('')} stroke="#111" strokeWidth={0.6} />
            {ruler.ticks
              .filter((t) => t.label !== null)
              .map((t, i) => (
                <text key={i} x={t.x + 4} y={22} fontSize={9} fontWeight={700} textAnchor="middle">
                  {t.label}
                </text>
              ))}
          </svg>
          {c.guideNote.map((n, i) => (
            <p key={i} style={{ fontSize: '7.5pt', margin: '2pt 0' }}>
              {n}
            </p>
          ))}
          <div style={{ display: 'flex', justifyContent: 'space-between' }}>
            {strips.map((st, i) => (
              <div key={i}>
                <b>{st.label}</b>
                <svg width={`${w}pt`} height={`${st.segments[0]!.length}pt`} viewBox={`0 0 ${w} ${st.segments[0]!.length}`} style={{ display: 'block' }}>
                  <rect x={0.25} y={0} width={w - 0.5} height={st.segments[0]!.length} fill="none" stroke="#555" strokeWidth={0.5} strokeDasharray="3 2" />
                  <path d={st.segments[0]!.ruler.map((m) => `M0 ${m.y}h${m.len}`).join('')} stroke="#555" strokeWidth={0.4} />
                  {st.segments[0]!.ticks.map((t, j) => (
                    <g key={j}>
                      <rect x={0} y={t.y - 0.5} width={w} height={t.cut ? 2 : 1} fill={t.cut ? CUT : '#111'} />
                      <text x={12} y={t.y + 9} fontSize={7} fontWeight={800} fill={t.cut ? CUT : '#111'}>{`${t.n} ${t.name}`}</text>
                      <text x={12} y={t.y + 17} fontSize={7} fill={t.cut ? CUT : '#111'}>
                        {t.text}
                      </text>
                    </g>
                  ))}
                </svg>
              </div>
            ))}
          </div>
        </aside>
      </div>
    </div>
  );
}

/** The page Chromium keeps open: Letter, the sheet's styles, Inter inlined and already drawn in all three weights, and an empty #sheet to fill. */
export function cutSheetShell(): string {
  const css = `${fontFaces()}@page{size:Letter;margin:28pt}body{margin:0;font-family:Inter;font-size:8.5pt;color:#111;font-variant-numeric:tabular-nums}h2{font-size:9.5pt;font-weight:800;margin:5pt 0 2pt}ol,ul{margin:0;padding-left:14pt}#warm{position:absolute;left:-9999px}`;
  // Text in each weight, off the page, so every face is decoded once when the page opens, not per print.
  const warm =
    '<div id="warm" aria-hidden="true"><span style="font-weight:400">Aa 0123456789 ½¼</span><b style="font-weight:700">Aa 0123456789</b><b style="font-weight:800">Aa 0123456789</b></div>';
  return `<!doctype html><html><head><meta charset="utf-8"><style>${css}</style></head><body>${warm}<div id="sheet"></div></body></html>`;
}

/** One cut sheet's markup, to put into the shell's #sheet. */
export function cutSheetBody(data: CutSheetData): string {
  return renderToStaticMarkup(<Sheet data={data} />);
}
