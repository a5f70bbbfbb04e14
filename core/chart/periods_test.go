package chart

import (
	"fmt"
	"slices"
	"testing"
	"time"
)

func quarterLabels(year, n int) []string {
	out := make([]string, n)
	for i := range out {
		out[i] = fmt.Sprintf("%04d-Q%d", year+i/4, i%4+1)
	}
	return out
}

func weekLabels(year, n int) []string {
	out := make([]string, n)
	for i := range out {
		out[i] = fmt.Sprintf("%04d-W%02d", year+i/52, i%52+1)
	}
	return out
}

func dayLabels(year, month, n int) []string {
	out := make([]string, n)
	d := time.Date(year, time.Month(month), 1, 0, 0, 0, 0, time.UTC)
	for i := range out {
		out[i] = d.AddDate(0, 0, i).Format("2006-01-02")
	}
	return out
}

func TestInferFrequency(t *testing.T) {
	tests := []struct {
		name   string
		labels []string
		want   Frequency
	}{
		{"yearly", []string{"2019", "2020"}, Yearly},
		{"quarterly", []string{"2024-Q1", "2024-Q2"}, Quarterly},
		{"monthly", []string{"2024-11", "2024-12", "2025-01"}, Monthly},
		{"weekly", []string{"2024-W52", "2025-W01"}, Weekly},
		{"daily", []string{"2024-02-28", "2024-02-29"}, Daily},
		{"blank labels skipped", []string{"", "2024-03", ""}, Monthly},
		{"mixed shapes", []string{"2024-03", "2024-Q2"}, Unlabelled},
		{"words", []string{"spring", "summer"}, Unlabelled},
		{"bad quarter", []string{"2024-Q5"}, Unlabelled},
		{"empty", nil, Unlabelled},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			if got := inferFrequency(tc.labels); got != tc.want {
				t.Errorf("inferFrequency(%q) = %d, want %d", tc.labels, got, tc.want)
			}
		})
	}
}

func TestPeriodTicks(t *testing.T) {
	// Expected ticks follow the rule in periodTicks' doc comment (common
	// practice for calendar axes: mark year starts over long spans).
	tests := []struct {
		name     string
		labels   []string
		freq     Frequency
		maxTicks int
		want     []string
	}{
		{"five years monthly shows years", monthLabels(2019, 60), Inferred, 10, []string{"2019", "2020", "2021", "2022", "2023"}},
		{"twenty years monthly every 5th year", monthLabels(2001, 240), Inferred, 6, []string{"2005", "2010", "2015", "2020"}},
		{"twenty years monthly every 2nd year", monthLabels(2001, 240), Inferred, 12, []string{"2002", "2004", "2006", "2008", "2010", "2012", "2014", "2016", "2018", "2020"}},
		{"one year monthly every quarter", monthLabels(2024, 12), Inferred, 5, []string{"2024-01", "2024-04", "2024-07", "2024-10"}},
		{"one year monthly every month", monthLabels(2024, 12), Inferred, 12, monthLabels(2024, 12)},
		{"two years quarterly all", quarterLabels(2022, 8), Inferred, 8, quarterLabels(2022, 8)},
		{"two years quarterly thinned", quarterLabels(2022, 8), Inferred, 4, []string{"2022-Q1", "2022-Q3", "2023-Q1", "2023-Q3"}},
		{"ten years quarterly", quarterLabels(2010, 40), Inferred, 12, []string{"2010", "2011", "2012", "2013", "2014", "2015", "2016", "2017", "2018", "2019"}},
		{"yearly every 5", []string{"2001", "2002", "2003", "2004", "2005", "2006", "2007", "2008", "2009", "2010", "2011"}, Inferred, 4, []string{"2005", "2010"}},
		{"horizons", []string{"1", "2", "3", "4", "5", "6", "7", "8", "9", "10", "11", "12"}, Unlabelled, 6, []string{"1", "3", "5", "7", "9", "11"}},
		{"forced unlabelled on months", monthLabels(2019, 60), Unlabelled, 10, []string{"2019-01", "2019-11", "2020-09", "2021-07", "2022-05", "2023-03"}},
		{"ten weeks every 4th", []string{"2024-W01", "2024-W02", "2024-W03", "2024-W04", "2024-W05", "2024-W06", "2024-W07", "2024-W08", "2024-W09", "2024-W10"}, Inferred, 4, []string{"2024-W01", "2024-W05", "2024-W09"}},
		{"a year of weeks by quarter", weekLabels(2024, 52), Inferred, 5, []string{"2024-W01", "2024-W14", "2024-W27", "2024-W40"}},
		{"four years of weeks by year", weekLabels(2021, 208), Inferred, 8, []string{"2021", "2022", "2023", "2024"}},
		{"ninety days by month", dayLabels(2024, 1, 91), Inferred, 6, []string{"2024-01", "2024-02", "2024-03"}},
		{"a year of days every 3rd month", dayLabels(2024, 1, 366), Inferred, 5, []string{"2024-01", "2024-04", "2024-07", "2024-10"}},
		{"single label", []string{"2024-03"}, Inferred, 5, []string{"2024-03"}},
		{"nothing", nil, Inferred, 5, nil},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			var got []string
			for _, tk := range periodTicks(tc.labels, tc.freq, tc.maxTicks) {
				got = append(got, tk.label)
				if tc.labels[tk.pos] == "" {
					t.Errorf("tick at a blank label")
				}
			}
			if !slices.Equal(got, tc.want) {
				t.Errorf("ticks = %q, want %q", got, tc.want)
			}
		})
	}
}
