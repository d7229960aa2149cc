package dev.tether.audit;

/**
 * The report's own look: a ledger-paper page, ink lines whose meaning is carried by line pattern and weight (not by
 * colour), so that it reads the same printed in grey.
 */
final class ReportStyle {
    private ReportStyle() {
    }

    static final String CSS = """
            body { font: 15px/1.45 Georgia, 'DejaVu Serif', serif; color: #1b1b1b; background: #fbfaf6; margin: 0 auto; max-width: 72rem; padding: 1rem 1.5rem; }
            h1 { font-size: 1.45rem; border-bottom: 3px double #1b1b1b; padding-bottom: .2rem; }
            h2 { font-size: 1.15rem; margin-top: 1.8rem; border-bottom: 1px solid #777; }
            a { color: #1b1b1b; }
            .facts { display: flex; flex-wrap: wrap; gap: .4rem 2rem; margin: .4rem 0 1rem; }
            .facts div b { display: block; font-size: 1.3rem; }
            table { border-collapse: collapse; width: 100%; font-size: .88rem; margin: .6rem 0; }
            th, td { border-bottom: 1px solid #bbb; padding: .25rem .4rem; text-align: left; vertical-align: top; }
            th { border-bottom: 2px solid #1b1b1b; font-weight: bold; }
            th.num { text-align: right; }
            td.num { text-align: right; font-variant-numeric: tabular-nums; white-space: nowrap; }
            tr.low td:first-child { font-weight: bold; }
            tr.low td:first-child::before { content: "! "; }
            .tag { font: .75rem monospace; border: 1px solid #1b1b1b; padding: 0 .25rem; white-space: nowrap; }
            .tag.solid { background: #1b1b1b; color: #fff; }
            .rows { margin: .4rem 0 1rem; }
            .row { display: flex; align-items: flex-start; border-left: 3px solid #bbb; margin: .35rem 0; padding-left: .4rem; }
            .row .no { font: .75rem monospace; width: 2.6rem; flex: none; padding-top: .2rem; color: #444; }
            .row .draw { overflow-x: auto; }
            .row p { margin: .1rem 0; font: 14px monospace; white-space: pre-wrap; }
            svg text.line { white-space: pre; }
            svg text { font-family: 'DejaVu Sans Mono', 'Liberation Mono', monospace; }
            .legend { border: 1px solid #777; padding: .4rem .8rem; font-size: .88rem; }
            .legend dl { display: grid; grid-template-columns: 5.5rem 1fr; gap: .2rem .8rem; margin: .2rem 0; }
            .legend dt { display: flex; align-items: center; }
            .charts { display: grid; grid-template-columns: repeat(auto-fit, minmax(22rem, 1fr)); gap: .5rem 2rem; }
            figure { margin: .4rem 0; }
            figcaption { font-size: .85rem; font-style: italic; }
            footer { margin-top: 2.5rem; border-top: 1px solid #777; font-size: .8rem; padding-top: .3rem; }
            @media print { body { background: #fff; max-width: none; } .row .draw { overflow: visible; } a { text-decoration: none; } }
            """;
}
