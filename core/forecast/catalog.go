package forecast

// ParamKind says how a parameter is written in a step.
type ParamKind int

const (
	// Number is any finite number within Min..Max, such as alpha=0.3.
	Number ParamKind = iota
	// Whole is a whole number within Min..Max, such as width=12.
	Whole
	// Choice is one word of Choices, such as season=multiplicative.
	Choice
	// List is a comma-separated list written in the Word of a [Setting]:
	// numbers for initial seasonal states (season0=-18,5,52,-39) or
	// method names for a combination (of=ses,holt,damped).
	List
)

// ParamSpec describes one parameter a method accepts.
type ParamSpec struct {
	Name    string    // as written in steps: "alpha", "width"
	Help    string    // one plain sentence for help and completion
	Kind    ParamKind // how the value is written
	Min     float64   // smallest accepted value (Number and Whole); may be -Inf
	Max     float64   // largest accepted value (Number and Whole); may be +Inf
	Choices []string  // accepted words (Choice)
	Default string    // value when left out; "" means estimated from the data
}

// Setting is one parameter value given by the user: Number for Number and
// Whole parameters, Word for Choice and List parameters.
type Setting struct {
	Number float64
	Word   string
}

// Settings holds the parameters given by the user, keyed by parameter name.
// A nil or empty Settings leaves every parameter at its default.
type Settings map[string]Setting

// Spec is one method of the catalogue: everything the step language needs
// to parse, check, complete and explain it, and the constructor.
type Spec struct {
	Name    string      // label in steps and tables, such as "holt-winters"
	Title   string      // display name, such as "Holt-Winters exponential smoothing"
	Summary string      // one or two plain sentences on what it does
	Source  string      // published source (book or paper, edition, section)
	Assumes string      // what the method assumes about the series, in plain words
	Follows Patterns    // patterns it can follow (for some choices, at most these)
	Params  []ParamSpec // accepted parameters, in the order shown in help
	// New builds the method from the user's settings. It returns an error
	// (naming the parameter, what was found and what is accepted) for an
	// unknown parameter, a value out of range or a word not among the choices.
	New func(Settings) (Method, error)
}

// Catalog returns every method of the package in the order a forecaster
// meets them: the benchmarks, the moving average, exponential smoothing,
// regression, Theta and combinations. Each call returns a fresh slice;
// changing it changes nothing in the package.
func Catalog() []Spec {
	specs := []Spec{
		naiveSpec(),
		seasonalNaiveSpec(),
		driftSpec(),
		meanSpec(),
		movingAverageSpec(),
		sesSpec(),
		holtSpec(),
		dampedSpec(),
		holtWintersSpec(),
		regressionSpec(),
		thetaSpec(),
		naive2Spec(),
		combinationSpec(),
	}
	for i := range specs {
		specs[i].New = checked(specs[i])
	}
	return specs
}

// Lookup returns the catalogue entry named name ("ses", "holt-winters", ...)
// and whether there is one.
func Lookup(name string) (Spec, bool) {
	for _, sp := range Catalog() {
		if sp.Name == name {
			return sp, true
		}
	}
	return Spec{}, false
}
