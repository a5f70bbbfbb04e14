package session

import "testing"

// TestDataNameWithSpaces checks that a data block's file name is the whole
// rest of its info line, so a file named with spaces survives a write and
// a read of the session.
func TestDataNameWithSpaces(t *testing.T) {
	t.Parallel()
	for _, name := range []string{"Orders 2024.csv", "shop  orders (final).csv", "orders.csv", `orders <b>x</b>.csv`} {
		t.Run(name, func(t *testing.T) {
			doc := Build([]Part{{Kind: Data, Name: name, Body: "month,units\n2024-01,5\n"}})
			back := Parse(doc.String())
			if len(back.Parts) != 1 || back.Parts[0].Kind != Data || back.Parts[0].Name != name {
				t.Fatalf("read back %+v from\n%s\nwant one data block named %q", back.Parts, doc.String(), name)
			}
		})
	}
}
