//go:build js && wasm

package store

import (
	"errors"
	"fmt"
	"strings"
	"testing"
	"time"
)

// clock returns a now func that advances one second per call, and an id
// func counting up, so saves are ordered and ids predictable.
func fixtures() (func() time.Time, func() string) {
	t := time.Date(2026, 3, 1, 9, 0, 0, 0, time.UTC)
	n := 0
	return func() time.Time { t = t.Add(time.Second); return t },
		func() string { n++; return fmt.Sprintf("s%d", n) }
}

func newSessions() (*Sessions, *Memory) {
	m := NewMemory()
	now, id := fixtures()
	return NewSessions(m, now, id), m
}

func TestSaveVersions(t *testing.T) {
	s, _ := newSessions()
	first, err := s.Save(Session{Title: "Orders", Text: "```quill\nsplit last=12\n```\n"})
	if err != nil {
		t.Fatal(err)
	}
	if first.ID != "s1" || first.Version != 1 {
		t.Fatalf("first save: id %q version %d, want s1 and 1", first.ID, first.Version)
	}
	if first.Datasets == nil {
		t.Error("a saved session must list its datasets as an empty list, not null")
	}
	first.Text += "more\n"
	second, err := s.Save(first)
	if err != nil {
		t.Fatal(err)
	}
	if second.Version != 2 || second.Saved <= first.Saved {
		t.Errorf("second save: version %d saved %s, want 2 and later than %s", second.Version, second.Saved, first.Saved)
	}
	got, err := s.Get("s1")
	if err != nil {
		t.Fatal(err)
	}
	if got.Text != second.Text || got.Version != 2 {
		t.Errorf("Get after two saves = %+v, want the second save", got)
	}
}

func TestSaveDetectsAnotherTab(t *testing.T) {
	s, _ := newSessions()
	opened, err := s.Save(Session{Title: "Orders", Text: "a"})
	if err != nil {
		t.Fatal(err)
	}
	// Two tabs open version 1; the first saves, the second must not
	// overwrite that save silently.
	tabA, tabB := opened, opened
	tabA.Text = "written in tab A"
	if _, err := s.Save(tabA); err != nil {
		t.Fatal(err)
	}
	tabB.Text = "written in tab B"
	_, err = s.Save(tabB)
	if !errors.Is(err, ErrConflict) {
		t.Fatalf("saving a stale version: error %v, want ErrConflict", err)
	}
	if !strings.Contains(err.Error(), "version 2 there, 1 here") {
		t.Errorf("conflict message %q does not give both versions", err)
	}
	got, _ := s.Get(opened.ID)
	if got.Text != "written in tab A" {
		t.Errorf("after the refused save the stored text is %q, want tab A's", got.Text)
	}
}

func TestListRenameDuplicateDelete(t *testing.T) {
	s, m := newSessions()
	a, _ := s.Save(Session{Title: "Orders"})
	b, _ := s.Save(Session{Title: "Revenue"})
	if _, err := s.Rename(a.ID, "Orders by month"); err != nil {
		t.Fatal(err)
	}
	c, err := s.Duplicate(b.ID, "Revenue (copy)")
	if err != nil {
		t.Fatal(err)
	}
	if c.ID == b.ID || c.Version != 1 {
		t.Errorf("duplicate: id %q version %d, want a new id and version 1", c.ID, c.Version)
	}
	list, err := s.List()
	if err != nil {
		t.Fatal(err)
	}
	var titles []string
	for _, x := range list {
		titles = append(titles, x.Title)
	}
	// Most recently saved first: the duplicate, then the rename, then b.
	if want := "Revenue (copy)|Orders by month|Revenue"; strings.Join(titles, "|") != want {
		t.Errorf("List titles %q, want %q", strings.Join(titles, "|"), want)
	}
	if err := s.Delete(b.ID); err != nil {
		t.Fatal(err)
	}
	if _, err := s.Get(b.ID); !errors.Is(err, ErrNotFound) {
		t.Errorf("Get after Delete: %v, want ErrNotFound", err)
	}
	if keys := strings.Join(m.keys(SessionBucket), ","); keys != "s1,s3" {
		t.Errorf("stored sessions %q, want s1,s3", keys)
	}
}

func TestDamagedRecord(t *testing.T) {
	s, m := newSessions()
	if err := m.Put(SessionBucket, "bad", []byte("{not json")); err != nil {
		t.Fatal(err)
	}
	if _, err := s.Get("bad"); err == nil || !strings.Contains(err.Error(), "damaged") {
		t.Errorf("Get of a damaged record: %v, want a 'damaged' error", err)
	}
	if _, err := s.List(); err == nil || !strings.Contains(err.Error(), "damaged") {
		t.Errorf("List with a damaged record: %v, want a 'damaged' error", err)
	}
}

func TestDatasets(t *testing.T) {
	m := NewMemory()
	now, _ := fixtures()
	d := NewDatasets(m, now)
	for _, f := range []struct{ name, body string }{{"weekly.csv", "w"}, {"Orders.csv", "month,units\n"}} {
		if _, err := d.Put(f.name, []byte(f.body)); err != nil {
			t.Fatal(err)
		}
	}
	list, err := d.List()
	if err != nil {
		t.Fatal(err)
	}
	if len(list) != 2 || list[0].Name != "Orders.csv" || list[0].Size != 12 {
		t.Errorf("List = %+v, want Orders.csv (12 bytes) first", list)
	}
	got, err := d.Get("Orders.csv")
	if err != nil || string(got.Data) != "month,units\n" {
		t.Errorf("Get = %q, %v; want the stored bytes", got.Data, err)
	}
	if err := m.Clear(); err != nil {
		t.Fatal(err)
	}
	if _, err := d.Get("Orders.csv"); !errors.Is(err, ErrNotFound) {
		t.Errorf("Get after Clear: %v, want ErrNotFound", err)
	}
}
