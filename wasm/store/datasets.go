//go:build js && wasm

package store

import (
	"cmp"
	"encoding/json"
	"fmt"
	"slices"
	"strings"
	"time"
)

// Dataset is one attached data file, kept as the bytes the user gave.
type Dataset struct {
	Name  string `json:"name"`  // the file name, as steps name it
	Data  []byte `json:"data"`  // the file's bytes
	Size  int    `json:"size"`  // len(Data)
	Added string `json:"added"` // time it was attached, RFC 3339 in UTC
}

// DatasetInfo is what the dataset list shows.
type DatasetInfo struct {
	Name  string `json:"name"`
	Size  int    `json:"size"`
	Added string `json:"added"`
}

// Datasets stores datasets in a [Backend], by file name.
type Datasets struct {
	b   Backend
	now func() time.Time
}

// NewDatasets returns the dataset store over b.
func NewDatasets(b Backend, now func() time.Time) *Datasets {
	return &Datasets{b: b, now: now}
}

// Put stores data under name, replacing a dataset of the same name.
func (d *Datasets) Put(name string, data []byte) (DatasetInfo, error) {
	ds := Dataset{Name: name, Data: data, Size: len(data), Added: d.now().UTC().Format(time.RFC3339Nano)}
	raw, err := json.Marshal(ds)
	if err != nil {
		return DatasetInfo{}, err
	}
	if err := d.b.Put(DatasetBucket, name, raw); err != nil {
		return DatasetInfo{}, err
	}
	return DatasetInfo{Name: ds.Name, Size: ds.Size, Added: ds.Added}, nil
}

// Get returns the dataset named name, or [ErrNotFound].
func (d *Datasets) Get(name string) (Dataset, error) {
	raw, ok, err := d.b.Get(DatasetBucket, name)
	if err != nil {
		return Dataset{}, err
	}
	if !ok {
		return Dataset{}, fmt.Errorf("dataset %q: %w; attach the file again", name, ErrNotFound)
	}
	var ds Dataset
	if err := json.Unmarshal(raw, &ds); err != nil {
		return Dataset{}, fmt.Errorf("the stored dataset %q is damaged (%v); attach the file again", name, err)
	}
	return ds, nil
}

// List returns every dataset, by name.
func (d *Datasets) List() ([]DatasetInfo, error) {
	all, err := d.b.All(DatasetBucket)
	if err != nil {
		return nil, err
	}
	out := make([]DatasetInfo, 0, len(all))
	for name, raw := range all {
		var ds Dataset
		if err := json.Unmarshal(raw, &ds); err != nil {
			return nil, fmt.Errorf("the stored dataset %q is damaged (%v); delete it and attach the file again", name, err)
		}
		out = append(out, DatasetInfo{Name: ds.Name, Size: ds.Size, Added: ds.Added})
	}
	slices.SortFunc(out, func(a, b DatasetInfo) int { return cmp.Compare(strings.ToLower(a.Name), strings.ToLower(b.Name)) })
	return out, nil
}

// Delete removes the dataset named name.
func (d *Datasets) Delete(name string) error {
	return d.b.Delete(DatasetBucket, name)
}
