// A decorative drawing for the sign-in screen: a panel section with holes over a cavity,
// and an absorption curve with its resonance peak in copper. Purely illustrative.
export function SheetArt() {
  const holes = Array.from({ length: 11 }, (_, i) => 40 + i * 26);
  return (
    <svg viewBox="0 0 360 260" className="w-full max-w-lg" role="img" aria-label="A perforated panel over an air cavity, and an absorption curve">
      <g stroke="#f6f2e9" strokeOpacity="0.5" fill="none">
        <rect x="24" y="24" width="312" height="212" strokeOpacity="0.25" />
        <line x1="24" y1="188" x2="336" y2="188" strokeOpacity="0.25" />
      </g>
      <g fill="#f6f2e9" fillOpacity="0.9">
        <rect x="30" y="196" width="300" height="6" />
      </g>
      <g fill="#1a2740">
        {holes.map((x) => (
          <rect key={x} x={x} y="196" width="6" height="6" />
        ))}
      </g>
      <g stroke="#f6f2e9" strokeOpacity="0.35" strokeDasharray="3 4">
        <line x1="30" y1="226" x2="330" y2="226" />
      </g>
      <text x="30" y="250" fill="#f6f2e9" fillOpacity="0.6" fontSize="10">
        facing · cavity · backing
      </text>
      <path d="M30 170 C 90 168, 120 150, 150 95 S 185 40, 200 60 S 240 150, 330 160" fill="none" stroke="#f6f2e9" strokeOpacity="0.35" strokeWidth="1.5" />
      <path d="M30 172 C 100 170, 130 140, 160 80 S 190 38, 205 52 S 250 140, 330 150" fill="none" stroke="#d98a55" strokeWidth="2.5" />
      <circle cx="192" cy="44" r="4" fill="#d98a55" />
      <g fill="#f6f2e9" fillOpacity="0.55" fontSize="9">
        <text x="30" y="40">α</text>
        <text x="60" y="184">125</text>
        <text x="120" y="184">250</text>
        <text x="180" y="184">500</text>
        <text x="240" y="184">1k</text>
        <text x="296" y="184">2k Hz</text>
      </g>
    </svg>
  );
}
