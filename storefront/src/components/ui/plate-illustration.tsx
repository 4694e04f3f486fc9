import { chakra, type HTMLChakraProps } from '@chakra-ui/react';

/**
 * Our hero drawing: a plated dessert seen from above. A disc of pistachio mousse, a quenelle
 * of caramel ice cream, a berry sauce laid in one stroke, crumble and leaves. Decorative only.
 */
export function PlateIllustration(props: HTMLChakraProps<'svg'>) {
  return (
    <chakra.svg
      viewBox="0 0 400 400"
      aria-hidden="true"
      focusable="false"
      css={{
        '& .halo': { fill: 'caramel.subtle' },
        '& .cloth': { fill: 'none', stroke: 'caramel.muted', strokeWidth: 2 },
        '& .plate': { fill: 'bg.subtle', stroke: 'border.emphasized', strokeWidth: 1.5 },
        '& .rim': { fill: 'none', stroke: 'border', strokeWidth: 10 },
        '& .well': { fill: 'none', stroke: 'border', strokeWidth: 1.5 },
        '& .sauce': {
          fill: 'none',
          stroke: 'danger.solid',
          strokeWidth: 9,
          strokeLinecap: 'round',
        },
        '& .sauce-dot': { fill: 'danger.solid' },
        '& .mousse': { fill: 'accent.solid' },
        '& .glaze': { fill: 'accent.emphasized' },
        '& .shine': { fill: 'bg.subtle', opacity: 0.7 },
        '& .quenelle': { fill: 'caramel.emphasized' },
        '& .quenelle-line': {
          fill: 'none',
          stroke: 'caramel.solid',
          strokeWidth: 2,
          strokeLinecap: 'round',
        },
        '& .crumble': { fill: 'caramel.solid' },
        '& .leaf': { fill: 'accent.fg' },
        '& .spoon': { fill: 'none', stroke: 'fg.muted', strokeWidth: 3, strokeLinecap: 'round' },
      }}
      {...props}
    >
      <circle className="halo" cx="200" cy="200" r="196" />
      <path className="cloth" d="M20 300 C 110 270, 160 330, 250 300 S 360 260, 392 290" />
      <circle className="plate" cx="200" cy="200" r="158" />
      <circle className="rim" cx="200" cy="200" r="146" />
      <circle className="well" cx="200" cy="200" r="112" />

      <path className="sauce" d="M118 250 C 150 222, 210 262, 262 232 S 300 196, 292 170" />
      <circle className="sauce-dot" cx="300" cy="150" r="6" />
      <circle className="sauce-dot" cx="305" cy="130" r="3.5" />

      <circle className="mousse" cx="170" cy="182" r="44" />
      <circle className="glaze" cx="170" cy="182" r="34" />
      <ellipse className="shine" cx="156" cy="166" rx="11" ry="6" transform="rotate(-30 156 166)" />

      <path
        className="quenelle"
        d="M222 226 C 228 200, 268 190, 292 206 C 300 212, 298 222, 288 228 C 266 242, 230 244, 222 226 Z"
      />
      <path className="quenelle-line" d="M234 222 C 248 212, 270 208, 286 212" />
      <path className="quenelle-line" d="M238 230 C 254 224, 272 222, 286 220" />

      <circle className="crumble" cx="214" cy="150" r="5" />
      <circle className="crumble" cx="226" cy="160" r="3.5" />
      <circle className="crumble" cx="236" cy="146" r="4" />
      <circle className="crumble" cx="206" cy="166" r="3" />
      <circle className="crumble" cx="128" cy="226" r="3.5" />
      <circle className="crumble" cx="140" cy="236" r="2.5" />

      <path
        className="leaf"
        d="M196 136 C 206 120, 224 118, 232 122 C 224 134, 208 140, 196 136 Z"
      />
      <path
        className="leaf"
        d="M190 140 C 184 124, 188 112, 194 106 C 200 118, 198 132, 190 140 Z"
      />

      <path className="spoon" d="M352 322 L 318 286" />
      <ellipse
        className="spoon"
        cx="306"
        cy="272"
        rx="11"
        ry="17"
        transform="rotate(-42 306 272)"
      />
    </chakra.svg>
  );
}
