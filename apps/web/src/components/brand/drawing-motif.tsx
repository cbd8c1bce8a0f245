import classes from './drawing-motif.module.css';

/**
 * Decorative section view of a ported block with its dimensions, drawn in the app's line
 * conventions (visible edges, centre lines, dimension lines). Purely ornamental.
 */
export function DrawingMotif() {
  return (
    <svg viewBox="0 0 420 300" className={classes.drawing} aria-hidden="true" focusable="false">
      <g className={classes.visible}>
        <path d="M60 60h240v180H60z" />
        <circle cx="180" cy="150" r="46" />
        <circle cx="180" cy="150" r="30" />
        <path d="M226 138h74M226 162h74" />
      </g>
      <g className={classes.hatch}>
        <path d="M300 138l-12 -12M292 138l-10 -10M300 162l12 12" />
      </g>
      <g className={classes.centre}>
        <path d="M180 84v132M114 150h200" />
      </g>
      <g className={classes.dimension}>
        <path d="M134 258h92M134 250v16M226 250v16" />
        <path d="M134 258l8 -3v6zM226 258l-8 -3v6z" className={classes.arrow} />
        <path d="M330 138v24M322 138h16M322 162h16" />
        <path d="M330 138l-3 8h6zM330 162l-3 -8h6z" className={classes.arrow} />
        <path d="M226 100l40 -40h54" />
      </g>
      <g className={classes.label}>
        <text x="180" y="282" textAnchor="middle">⌀ 92 H7</text>
        <text x="346" y="154">12</text>
        <text x="270" y="54">t ≥ 2.5</text>
      </g>
    </svg>
  );
}
