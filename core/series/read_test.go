package series

import (
	"fmt"
	"strings"
	"testing"
)

// dump writes what Read found in a compact form for comparison: the
// layout and frequency, then one line per series with its start and
// values.
func dump(ds *Dataset) string {
	var b strings.Builder
	fmt.Fprintf(&b, "%s %s", ds.Layout, ds.Frequency)
	for _, s := range ds.Series {
		fmt.Fprintf(&b, "\n%s %s [", s.Name, s.Start)
		for i, v := range s.Values {
			if i > 0 {
				b.WriteByte(' ')
			}
			b.WriteString(formatValue(v))
		}
		b.WriteByte(']')
	}
	return b.String()
}

// readTests pairs inputs with what Read must find. Expected values are
// hand calculations from the input text shown.
var readTests = []struct {
	name     string
	in       string
	opt      ReadOptions
	want     string // dump of the dataset
	decision string // text one decision must contain; "" for none
}{
	{name: "comma, month", in: "month,units\n2024-01,10\n2024-02,12\n2024-03,9\n",
		want: "wide month\nunits 2024-01 [10 12 9]"},
	{name: "semicolon and decimal comma", in: "Monat;Menge\n2024-01;10,5\n2024-02;1.204,25\n",
		want: "wide month\nMenge 2024-01 [10.5 1204.25]", decision: "commas are decimal marks"},
	{name: "tab", in: "week\torders\n2024-W01\t5\n2024-W02\t6\n",
		want: "wide week\norders 2024-W01 [5 6]", decision: "separated by tabs"},
	{name: "pipe", in: "quarter|revenue\n2024-Q1|100\n2024-Q2|110\n",
		want: "wide quarter\nrevenue 2024-Q1 [100 110]", decision: "vertical bars"},
	{name: "quoted delimiter and newline", in: "month,units,note\n2024-01,\"1,204.5\",\"first,\nsecond\"\n2024-02,\"1,000\",\"say \"\"hi\"\"\"\n",
		want: "wide month\nunits 2024-01 [1204.5 1000]", decision: "points are decimal marks"},
	{name: "UTF-8 byte-order mark", in: "\uFEFFmonth,units\n2024-01,1\n2024-02,2\n",
		want: "wide month\nunits 2024-01 [1 2]", decision: `"month", "units"`},
	{name: "CRLF line ends and blank lines", in: "month,units\r\n\r\n2024-01,1\r\n,\r\n2024-02,2\r\n\r\n",
		want: "wide month\nunits 2024-01 [1 2]"},
	{name: "no header", in: "2024-01,1\n2024-02,2\n",
		want: "wide month\ncolumn 2 2024-01 [1 2]", decision: "holds data, not column names"},
	{name: "trailing delimiter on data rows", in: "month,units\n2024-01,1,\n2024-02,2,\n",
		want: "wide month\nunits 2024-01 [1 2]"},
	{name: "thousands with comma", in: "month,units\n2024-01,\"1,234.5\"\n2024-02,\"2,000\"\n",
		want: "wide month\nunits 2024-01 [1234.5 2000]", decision: "points are decimal marks"},
	{name: "thousands with point", in: "month;units\n2024-01;1.234,5\n2024-02;2.000\n",
		want: "wide month\nunits 2024-01 [1234.5 2000]", decision: "commas are decimal marks"},
	{name: "thousands with space", in: "month;units\n2024-01;1 234,5\n2024-02;12 000\n",
		want: "wide month\nunits 2024-01 [1234.5 12000]", decision: "commas are decimal marks"},
	{name: "thousands with no-break space and apostrophe", in: "month;a;b\n2024-01;1\u00a0234,5;1'234.5\n2024-02;2,5;3.5\n",
		want: "wide month\na 2024-01 [1234.5 2.5]\nb 2024-01 [1234.5 3.5]"},
	{name: "currency and percent", in: "month;revenue;margin\n2024-01;€1.234,50;12,5%\n2024-02;€ 980,00;-3%\n",
		want: "wide month\nrevenue 2024-01 [1234.5 980]\nmargin 2024-01 [12.5 -3]", decision: "percent signs"},
	{name: "dollar, code and parentheses", in: "month,cost\n2024-01,$1200.00\n2024-02,($35.10)\n2024-03,USD 12\n2024-04,12 EUR\n",
		want: "wide month\ncost 2024-01 [1200 -35.1 12 12]", decision: "currency signs"},
	{name: "missing markers", in: "month,units\n2024-01,1\n2024-02,NA\n2024-03,N/A\n2024-04,-\n2024-05,null\n2024-06,\n2024-07,7\n",
		want: "wide month\nunits 2024-01 [1 missing missing missing missing missing 7]"},
	{name: "extra missing marker", in: "month,units\n2024-01,1\n2024-02,n.v.\n2024-03,3\n", opt: ReadOptions{Missing: []string{"n.v."}},
		want: "wide month\nunits 2024-01 [1 missing 3]"},
	{name: "exponent", in: "month,units\n2024-01,1.5e3\n2024-02,2E-1\n",
		want: "wide month\nunits 2024-01 [1500 0.2]"},
	{name: "days", in: "date,calls\n2024-03-01,5\n2024-03-02,6\n2024-03-03,7\n",
		want: "wide day\ncalls 2024-03-01 [5 6 7]"},
	{name: "month compact quarter", in: "period,sales\n2024Q1,1\n2024Q2,2\n",
		want: "wide quarter\nsales 2024-Q1 [1 2]"},
	{name: "quarter first", in: "period,sales\nQ4 2023,1\nQ1 2024,2\n",
		want: "wide quarter\nsales 2023-Q4 [1 2]"},
	{name: "years", in: "year,flow\n1871,1120\n1872,1160\n",
		want: "wide year\nflow 1871 [1120 1160]"},
	{name: "month slash year", in: "period,units\n11/2023,1\n12/2023,2\n01/2024,3\n",
		want: "wide month\nunits 2023-11 [1 2 3]"},
	{name: "day first decided by a value", in: "date,units\n31/01/2024,1\n01/02/2024,2\n02/02/2024,3\n",
		want: "wide day\nunits 2024-01-31 [1 2 3]", decision: "read day first"},
	{name: "month first decided by a value", in: "date,units\n01/31/2024,1\n02/01/2024,2\n02/02/2024,3\n",
		want: "wide day\nunits 2024-01-31 [1 2 3]", decision: "read month first"},
	{name: "ambiguous order with option", in: "date,units\n01/02/2024,1\n02/02/2024,2\n", opt: ReadOptions{DateOrder: DayFirst},
		want: "wide day\nunits 2024-02-01 [1 2]", decision: "as the date order option says"},
	{name: "month names", in: "month,units\nJan 2024,1\nFeb 2024,2\nMarch 2024,3\nSept 2024,9\n",
		want: "wide month\nunits 2024-01 [1 2 3 missing missing missing missing missing 9]"},
	{name: "month names with dash", in: "month,units\nDec-2023,1\nJAN-2024,2\n",
		want: "wide month\nunits 2023-12 [1 2]"},
	{name: "first of month dates are months", in: "date,units\n2024-01-01,1\n2024-02-01,2\n2024-03-01,3\n",
		want: "wide month\nunits 2024-01 [1 2 3]", decision: "the first day of their month"},
	{name: "month-end dates are months", in: "date,units\n2024-01-31,1\n2024-02-29,2\n2024-03-31,3\n",
		want: "wide month\nunits 2024-01 [1 2 3]", decision: "the last day of their month"},
	{name: "quarter-end dates are quarters", in: "date,units\n2024-03-31,1\n2024-06-30,2\n2024-09-30,3\n",
		want: "wide quarter\nunits 2024-Q1 [1 2 3]", decision: "read as quarters"},
	{name: "Monday dates are weeks", in: "date,units\n2024-01-01,1\n2024-01-08,2\n2024-01-15,3\n",
		want: "wide week\nunits 2024-W01 [1 2 3]", decision: "fall on a Monday"},
	{name: "dates with times on monthly data", in: "timestamp,units\n2024-01-01 00:00:00,1\n2024-02-01T00:00,2\n2024-03-01 00:00,3\n",
		want: "wide month\nunits 2024-01 [1 2 3]", decision: "the time is dropped"},
	{name: "days mapped to months by option", in: "date,units\n2024-01-05,1\n2024-01-20,2\n2024-02-11,3\n", opt: ReadOptions{Frequency: Month, Duplicates: Sum},
		want: "wide month\nunits 2024-01 [3 3]", decision: "as the frequency option says"},
	{name: "year and quarter columns", in: "year,quarter,sales\n1990,1,362\n1990,2,385\n1990,3,432\n",
		want: "wide quarter\nsales 1990-Q1 [362 385 432]", decision: "together give the periods"},
	{name: "year and month name columns", in: "year,month,sales\n2024,Jan,1\n2024,Feb,2\n",
		want: "wide month\nsales 2024-01 [1 2]"},
	{name: "no period column", in: "units\n5\n6\n7\n",
		want: "wide index\nunits 1 [5 6 7]", decision: "numbered 1, 2, 3"},
	{name: "index column", in: "t,value\n1,71\n2,70\n",
		want: "wide index\nvalue 1 [71 70]"},
	{name: "row counter left out", in: "row,month,units\n1,2024-01,5\n2,2024-02,6\n",
		want: "wide month\nunits 2024-01 [5 6]", decision: "numbers the rows"},
	{name: "text column left out", in: "month,units,comment\n2024-01,5,ok\n2024-02,6,late delivery\n",
		want: "wide month\nunits 2024-01 [5 6]", decision: "holds text"},
	{name: "two value columns", in: "month,units,returns\n2024-01,5,1\n2024-02,6,0\n",
		want: "wide month\nunits 2024-01 [5 6]\nreturns 2024-01 [1 0]"},
	{name: "chosen value column", in: "month,units,returns\n2024-01,5,1\n2024-02,6,0\n", opt: ReadOptions{Values: []string{"Returns"}},
		want: "wide month\nreturns 2024-01 [1 0]"},
	{name: "chosen date column", in: "start,end,units\n2024-01,2024-02,5\n2024-02,2024-03,6\n", opt: ReadOptions{Date: "end"},
		want: "wide month\nunits 2024-02 [5 6]"},
	{name: "series starting later", in: "month,a,b\n2024-01,1,\n2024-02,2,5\n2024-03,3,6\n",
		want: "wide month\na 2024-01 [1 2 3]\nb 2024-02 [5 6]", decision: "left out"},
	{name: "long layout", in: "shop,month,units\nHarbour,2024-01,5\nHarbour,2024-02,6\nMill,2024-01,7\nMill,2024-02,8\n",
		want: "long month\nHarbour 2024-01 [5 6]\nMill 2024-01 [7 8]", decision: "long layout"},
	{name: "long layout interleaved", in: "month,shop,units\n2024-01,Harbour,5\n2024-01,Mill,7\n2024-02,Harbour,6\n2024-02,Mill,8\n",
		want: "long month\nHarbour 2024-01 [5 6]\nMill 2024-01 [7 8]"},
	{name: "long layout with numeric keys", in: "store,week,units\n101,2024-W01,5\n101,2024-W02,6\n102,2024-W01,7\n102,2024-W02,8\n",
		want: "long week\n101 2024-W01 [5 6]\n102 2024-W01 [7 8]"},
	{name: "long layout with positions", in: "series,period,value\nA,1,5\nA,2,6\nB,1,7\nB,2,8\nB,3,9\n",
		want: "long index\nA 1 [5 6]\nB 1 [7 8 9]"},
	{name: "long layout by option", in: "what,month,units\nx,2024-01,5\ny,2024-02,6\n", opt: ReadOptions{Series: "what"},
		want: "long month\nx 2024-01 [5]\ny 2024-02 [6]"},
	{name: "long layout with two value columns", in: "shop,month,units,returns\nH,2024-01,5,1\nH,2024-02,6,0\nM,2024-01,7,2\nM,2024-02,8,1\n",
		want: "long month\nH units 2024-01 [5 6]\nH returns 2024-01 [1 0]\nM units 2024-01 [7 8]\nM returns 2024-01 [2 1]"},
	{name: "row filter", in: "series,period,value,role\nA,1,5,fit\nA,2,6,fit\nA,3,7,test\n", opt: ReadOptions{Only: Match{Column: "role", Value: "fit"}},
		want: "long index\nA 1 [5 6]", decision: "only rows"},
	{name: "gap left missing", in: "month,units\n2024-01,1\n2024-03,3\n",
		want: "wide month\nunits 2024-01 [1 missing 3]"},
	{name: "one column with decimal comma", in: "Menge\n1,5\n2,25\n",
		want: "wide index\nMenge 1 [1.5 2.25]"},
	{name: "ambiguous mark settled by another column", in: "month;a;b\n2024-01;1,5;1.234\n2024-02;2,5;2.000\n",
		want: "wide month\na 2024-01 [1.5 2.5]\nb 2024-01 [1234 2000]", decision: "follows column"},
	{name: "decimal mark by option", in: "month;units\n2024-01;1.234\n2024-02;2.000\n", opt: ReadOptions{DecimalMark: ','},
		want: "wide month\nunits 2024-01 [1234 2000]"},
	{name: "delimiter by option", in: "month;units,x\n2024-01;1\n", opt: ReadOptions{Delimiter: ';'},
		want: "wide month\nunits,x 2024-01 [1]"},
	{name: "header by option", in: "2024-01,1\n2024-02,2\n", opt: ReadOptions{Header: WithHeader},
		want: "wide month\n1 2024-02 [2]"},
	{name: "duplicate header names", in: "month,units,units\n2024-01,1,2\n",
		want: "wide month\nunits 2024-01 [1]\nunits (2) 2024-01 [2]", decision: "repeats the name"},
	{name: "negative with unicode minus and trailing minus", in: "month,units\n2024-01,\u22125\n2024-02,7-\n",
		want: "wide month\nunits 2024-01 [-5 -7]"},
	{name: "Indian grouping", in: "month,units\n2024-01,\"1,23,456.5\"\n",
		want: "wide month\nunits 2024-01 [123456.5]"},
	{name: "comments do not make a long layout", in: "month,units,comment\n2024-01,5,ok\n2024-01,6,again\n2024-02,7,fine\n2024-03,8,good\n",
		want: "wide month\nunits 2024-01 [missing 7 8]"},
	{name: "four-digit numbers with three decimals", in: "month,price\n2024-01,1234.567\n2024-02,2345.678\n",
		want: "wide month\nprice 2024-01 [1234.567 2345.678]"},
	{name: "day and month name", in: "date,units\n1 Mar 2024,1\n02-Mar-2024,2\n3/March/2024,3\n",
		want: "wide day\nunits 2024-03-01 [1 2 3]"},
	{name: "month name, day and year", in: "date,units\n\"Mar 1, 2024\",1\n\"Mar 2, 2024\",2\n",
		want: "wide day\nunits 2024-03-01 [1 2]"},
	{name: "dotted day-first dates", in: "Datum;Umsatz\n31.01.2024;1.234,56\n01.02.2024;99,5\n",
		want: "wide day\nUmsatz 2024-01-31 [1234.56 99.5]", decision: "read day first"},
	{name: "title above the table", in: "Wickery orders report\n\n\"month\",\"units\"\n2024-01,5\n2024-02,6\n",
		want: "wide month\nunits 2024-01 [5 6]", decision: "is a title above the table"},
	{name: "long layout without a header", in: "A,2024-01,5\nA,2024-02,6\nB,2024-01,7\nB,2024-02,8\n", opt: ReadOptions{Layout: Long},
		want: "long month\nA 2024-01 [5 6]\nB 2024-01 [7 8]", decision: "holds data, not column names"},
	{name: "across layout", in: "shop,2024-01,2024-02,2024-03\nHarbour Row,412,398,455\nOld Mill,377,,390\n",
		want: "across month\nHarbour Row 2024-01 [412 398 455]\nOld Mill 2024-01 [377 missing 390]", decision: "across layout"},
	{name: "across layout with quarters and a category", in: "item;group;Q1 2024;Q2 2024;Q3 2024\nwick;parts;1,5;2,5;3\njar;glass;;7;8\n",
		want: "across quarter\nwick 2024-Q1 [1.5 2.5 3]\njar 2024-Q2 [7 8]", decision: "commas are decimal marks"},
	{name: "across layout with years and a missing column", in: "region,2019,2020,2022\nNorth,1,2,4\n",
		want: "across year\nNorth 2019 [1 2 missing 4]"},
	{name: "wide layout with years as column names", in: "month,2023,2024\n2024-01,5,6\n2024-02,7,8\n",
		want: "wide month\n2023 2024-01 [5 7]\n2024 2024-01 [6 8]"},
	{name: "spreadsheet day numbers", in: "date,units\n45292,1\n45323,2\n45352,3\n", // 45292 is 2024-01-01 (hand calculation: 25569 + 19723 days)
		want: "wide month\nunits 2024-01 [1 2 3]", decision: "spreadsheet day numbers"},
	{name: "year column beside a full month column", in: "year,month,units\n2024,2024-01,5\n2024,2024-02,6\n",
		want: "wide month\nunits 2024-01 [5 6]"},
	{name: "days mapped to ISO weeks by option", in: "date,units\n2024-01-01,1\n2024-01-07,2\n2024-01-08,4\n", opt: ReadOptions{Frequency: Week, Duplicates: Sum},
		want: "wide week\nunits 2024-W01 [3 4]"}, // 1 and 7 January 2024 are the Monday and Sunday of 2024-W01
	{name: "months mapped to quarters by option", in: "month,units\n2024-01,1\n2024-02,2\n2024-04,4\n", opt: ReadOptions{Frequency: Quarter, Duplicates: Mean},
		want: "wide quarter\nunits 2024-Q1 [1.5 4]"},
	{name: "quarters mapped to years by option", in: "quarter,units\n2023-Q4,1\n2024-Q1,2\n2024-Q2,3\n", opt: ReadOptions{Frequency: Year, Duplicates: Sum},
		want: "wide year\nunits 2023 [1 5]"},
	{name: "Sunday dates are weeks", in: "week ending,units\n2024-01-07,1\n2024-01-14,2\n", opt: ReadOptions{Date: "week ending"},
		want: "wide week\nunits 2024-W01 [1 2]", decision: "fall on a Sunday"},
	{name: "ISO week 53", in: "week,units\n2020-W52,1\n2020-W53,2\n2021-W01,3\n",
		want: "wide week\nunits 2020-W52 [1 2 3]"},
}

func TestRead(t *testing.T) {
	t.Parallel()
	for _, tt := range readTests {
		t.Run(tt.name, func(t *testing.T) {
			t.Parallel()
			ds, err := Read([]byte(tt.in), "test.csv", tt.opt)
			if err != nil {
				t.Fatalf("Read(%q): %v", tt.in, err)
			}
			if got := dump(ds); got != tt.want {
				t.Errorf("Read(%q)\n got %s\nwant %s\ndecisions: %q", tt.in, got, tt.want, ds.Decisions)
			}
			if tt.decision != "" && !containsDecision(ds, tt.decision) {
				t.Errorf("no decision mentions %q; decisions: %q", tt.decision, ds.Decisions)
			}
		})
	}
}

func containsDecision(ds *Dataset, part string) bool {
	for _, d := range ds.Decisions {
		if strings.Contains(d, part) {
			return true
		}
	}
	return false
}
