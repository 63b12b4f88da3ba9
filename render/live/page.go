package live

import (
	"fmt"
	"html/template"
	"path/filepath"
	"strconv"
	"strings"

	"github.com/tremie-dev/tremie/schema/quantity"
	"github.com/tremie-dev/tremie/schema/rules"
)

// qrow is one quantities row as the page prints it.
type qrow struct {
	Label, Material, Interval, Calculated, Needed, Placed, Ratio string
}

func quantityRows(r *quantity.Report) []qrow {
	if r == nil || r.Well == nil {
		return nil
	}
	u := r.Well.Units
	var out []qrow
	for _, row := range r.AllRows() {
		q := qrow{Label: row.Label(), Material: row.Fill.Material.Words(), Interval: u.FormatInterval(row.Fill.Top, row.Fill.Bottom)}
		if row.IsPad() {
			q.Material = "concrete pad"
		}
		if row.Err != nil {
			q.Calculated = row.Err.Error()
		} else {
			q.Calculated = quantity.FormatVolume(row.Calculated, u)
		}
		if row.HasYield {
			q.Needed = fmt.Sprint(row.BagsNeeded)
		}
		if row.Recorded {
			q.Placed = quantity.FormatVolume(row.Placed, u)
			if row.BagsPlaced > 0 {
				q.Placed = bagsText(row.BagsPlaced) + ", " + q.Placed
			}
		}
		if row.Ratio > 0 {
			q.Ratio = fmt.Sprintf("%.0f %%", row.Ratio*100)
		}
		out = append(out, q)
	}
	return out
}

// tally says how many findings of each kind a well has: "none",
// "4 errors, 2 warnings", "1 waived".
func tally(fs []rules.Finding) string {
	t := rules.Count(fs)
	var parts []string
	for _, c := range []struct {
		n           int
		one, plural string
	}{{t.Errors, "error", "errors"}, {t.Warnings, "warning", "warnings"}, {t.Waived, "waived", "waived"}} {
		switch {
		case c.n == 1:
			parts = append(parts, "1 "+c.one)
		case c.n > 1:
			parts = append(parts, strconv.Itoa(c.n)+" "+c.plural)
		}
	}
	if parts == nil {
		return "none"
	}
	return strings.Join(parts, ", ")
}

// bagsText counts bags: "1 bag", "1.5 bags", "9 bags".
func bagsText(n float64) string {
	if n == 1 {
		return "1 bag"
	}
	return strconv.FormatFloat(n, 'f', -1, 64) + " bags"
}

var pageTemplate = template.Must(template.New("page").Funcs(template.FuncMap{
	"qrows":   quantityRows,
	"base":    filepath.Base,
	"inc":     func(n int) int { return n + 1 },
	"tally":   tally,
	"caution": rules.PlainCaution,
}).Parse(pageHTML))

const pageHTML = `<!doctype html>
<html lang="en"><head><meta charset="utf-8">
<title>tremie · {{base .Dir}}</title>
<style>
body{font:14px/1.4 system-ui,sans-serif;margin:0;color:#222;background:#f4f4f1}
header{position:sticky;top:0;background:#2f3b45;color:#fff;padding:.5em 1em;z-index:2}
header small{opacity:.75}
main{padding:0 1em 4em}
.problem,.problems{background:#fde8e6;border-left:4px solid #b3261e;padding:.5em 1em;margin:1em 0}
.problem code,.problems code{white-space:pre-wrap;overflow-wrap:anywhere}
table{border-collapse:collapse}
td,th{padding:.15em .6em;text-align:left;border-bottom:1px solid #ddd}
.st{display:inline-block;padding:0 .5em;border-radius:.8em;font-size:.85em;font-weight:600}
.st.clean{background:#d7efd9;color:#1b5e20}.st.warnings{background:#fff1c9;color:#7a5300}
.st.errors,.st.unreadable{background:#fbd5d1;color:#8c1d18}.st.planned{background:#dde7f6;color:#1f3f77}
.st.waived{background:#e4ebe4;color:#33503a}
section.well{scroll-margin-top:3em;background:#fff;margin:1.2em 0;padding:.6em 1em;border-radius:6px;box-shadow:0 1px 3px #0002}
section.well h2{margin:.2em 0}section.well h2 small{font-weight:normal;color:#777;font-size:.6em}
li.error code,li.warning code,li.waived code{color:#555}
li.error b{color:#8c1d18}li.warning b{color:#7a5300}li.waived b{color:#666}
.sheets img{display:block;width:100%;max-width:1000px;height:auto;margin:.6em 0;border:1px solid #ccc;background:#fff}
.caution{color:#555;font-size:.85em;font-style:italic;margin:.6em 0}
</style></head>
<body>
<header><b>tremie serve</b> <small>{{.Dir}}</small> <small id="state">live</small></header>
<main>{{template "body" .}}</main>
<script>
(function () {
  var busy = false, again = false;
  function update() {
    if (busy) { again = true; return; }
    busy = true;
    fetch('/wells', {cache: 'no-store'}).then(function (r) { return r.text(); }).then(function (html) {
      var fresh = new DOMParser().parseFromString(html, 'text/html').getElementById('body');
      var cur = document.getElementById('body');
      if (!fresh || !cur || fresh.dataset.version === cur.dataset.version) { return; }
      var y = window.scrollY, old = {};
      cur.querySelectorAll('section.well').forEach(function (s) { old[s.dataset.key + '|' + s.dataset.v] = s; });
      fresh.querySelectorAll('section.well').forEach(function (s) {
        var keep = old[s.dataset.key + '|' + s.dataset.v];
        if (keep) { s.replaceWith(keep); } // unchanged: its sheets need not load again
      });
      cur.replaceWith(document.adoptNode(fresh));
      window.scrollTo(0, y);
    }).catch(function () {}).finally(function () {
      busy = false;
      if (again) { again = false; update(); }
    });
  }
  var es = new EventSource('/events');
  es.onmessage = update;
  es.onerror = function () { document.getElementById('state').textContent = 'reconnecting'; };
  es.onopen = function () { document.getElementById('state').textContent = 'live'; };
})();
</script>
</body></html>
{{define "body"}}<div id="body" data-version="{{.Version}}">
{{range .Problems}}<div class="problem"><code>{{.}}</code></div>{{end}}
{{if not .Wells}}<p>No well to show{{if .Problems}} until the problem above is fixed{{end}}.</p>{{else}}
<table class="index"><tr><th>well</th><th>status</th><th>file</th><th>findings</th></tr>
{{range $i, $w := .Wells}}<tr><td><a href="#w{{$i}}">{{or $w.ID $w.Key}}</a></td><td><span class="st {{$w.Status}}">{{$w.Status}}</span></td><td>{{$w.Key}}</td><td>{{if $w.Problems}}input error{{else}}{{tally $w.Findings}}{{end}}</td></tr>
{{end}}</table>{{end}}
<p class="caution">{{caution}}</p>
{{range $i, $w := .Wells}}
<section class="well" id="w{{$i}}" data-key="{{$w.Key}}" data-v="{{$w.Version}}" data-id="{{$w.ID}}">
<h2>{{or $w.ID $w.Key}} <span class="st {{$w.Status}}">{{$w.Status}}</span> <small>{{$w.Key}}</small></h2>
{{if $w.Problems}}<div class="problems"><b>This well cannot be checked or drawn; its sheet returns when this is fixed.</b>
<ul>{{range $w.Problems}}<li><code>{{.Error}}</code></li>{{end}}</ul></div>
{{else}}
<h3>Findings</h3>
<p class="thresholds"><small>{{$w.Thresholds}}.</small></p>
{{if $w.Findings}}<ul class="findings">{{range $w.Findings}}<li class="{{.Label}}"><code>{{.File}}:{{.Line}}</code> <b>{{.Label}} {{.Rule}}</b>: {{.Message}}</li>{{end}}</ul>{{else}}<p>No findings.</p>{{end}}
{{with qrows $w.Quantities}}<h3>Quantities</h3>
<table class="qty"><tr><th>#</th><th>material</th><th>interval</th><th>calculated</th><th>bags needed</th><th>placed</th><th>placed / calculated</th></tr>
{{range .}}<tr><td>{{.Label}}</td><td>{{.Material}}</td><td>{{.Interval}}</td><td>{{.Calculated}}</td><td>{{.Needed}}</td><td>{{.Placed}}</td><td>{{.Ratio}}</td></tr>{{end}}</table>{{end}}
<div class="sheets">{{$count := len $w.Sheets}}{{range $n, $sh := $w.Sheets}}<img src="/sheet/{{$i}}/{{$n}}.svg?v={{$w.Version}}" alt="{{$w.ID}}, sheet {{inc $n}} of {{$count}}" style="aspect-ratio: {{$sh.Aspect}}" loading="lazy">{{end}}</div>
{{end}}
</section>
{{end}}
</div>{{end}}
`
