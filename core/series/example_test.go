package series_test

import (
	"fmt"

	"quillcast/core/series"
)

func ExampleRead() {
	file := []byte("month;units\n2024-01;1.204,5\n2024-02;1.187\n2024-04;1.310,25\n")
	ds, err := series.Read(file, "orders.csv", series.ReadOptions{})
	if err != nil {
		fmt.Println(err)
		return
	}
	s := ds.Series[0]
	fmt.Println(s.Name, s.Start, s.End(), s.Values)
	for _, d := range ds.Decisions {
		fmt.Println("decided:", d)
	}
	for _, p := range ds.Problems {
		fmt.Println("problem:", p)
	}
	// Output:
	// units 2024-01 2024-04 [1204.5 1187 NaN 1310.25]
	// decided: cells are separated by semicolons
	// decided: the first line holds the column names: "month", "units"
	// decided: column "month" holds the periods, written like "2024-01"
	// decided: column "units": commas are decimal marks and points or spaces group thousands (1.234,5 is one thousand two hundred thirty-four and a half), decided from all 3 numbers, such as "1.204,5" on line 2
	// decided: each value column is one series: "units"
	// problem: series "units" has no row for 2024-03, between line 3 and line 4; add the missing rows, or set fill to carry forward, linear or seasonal
}

func ExampleRead_error() {
	file := []byte("month,units\n2024-01,12\n2024-02,12O\n")
	_, err := series.Read(file, "orders.csv", series.ReadOptions{})
	fmt.Println(err)
	// Output:
	// line 3, column "units": "12O" is not a number (a letter O instead of a zero?); correct the cell or mark it missing with NA
}

func ExampleParsePeriod() {
	p, err := series.ParsePeriod("2024-W52")
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println(p.Freq, p, p.Add(1), p.Freq.DefaultSeason())
	// Output:
	// week 2024-W52 2025-W01 52
}
