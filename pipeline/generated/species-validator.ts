// @ts-nocheck
/* eslint-disable */
/**
 * GENERATED from schemas/species.schema.json by scripts/generate-validators.mjs (ajv standalone code). Do not edit by
 * hand: change the schema and run `npm run build && node scripts/generate-validators.mjs`. A test fails
 * when this file drifts.
 */
import { createRequire } from 'node:module';
const require = createRequire(import.meta.url);

export const validateSpeciesInput = validate20;
const schema31 = {"$schema":"https://json-schema.org/draft/2020-12/schema","$id":"https://qforge.invalid/schemas/species.schema.json","title":"a species definition","description":"One species of a qforge database, as written in a YAML document. Unknown keys are errors. Quantities with a unit are a bare number in the default unit or {value, unit}.","type":"object","additionalProperties":false,"required":["name","composition","enthalpy_of_formation","sources","structure"],"properties":{"name":{"title":"1-16 characters from A-Z a-z 0-9 ( ) + * , . _ - (the name field of the 80-column record)","description":"Record name of the species, 1-16 characters (the name field of the 80-column record) of [A-Za-z0-9()+*,._-]; unique in a database.","type":"string","minLength":1,"maxLength":16,"pattern":"^[A-Za-z0-9()+*,._-]*$"},"composition":{"title":"a mapping of element symbol to a whole number >= 1","description":"Element symbol (IUPAC; D and T accepted for 2H and 3H) -> number of atoms.","type":"object","minProperties":1,"additionalProperties":{"$ref":"#/$defs/positiveInteger"}},"charge":{"title":"a whole number (0 for a neutral species)","description":"Charge number z: +1 for a singly charged cation, -1 for an anion. Default 0. The molar mass is corrected for the electrons.","type":"integer","default":0},"enthalpy_of_formation":{"title":"a number in kJ/mol, or {value, unit?, temperature?}","description":"Standard enthalpy of formation. A bare number is in kJ/mol at 298.15 K; or {value, unit, temperature} with unit one of J/mol, kJ/mol, kcal/mol, eV, cm-1 (default kJ/mol) and temperature 298.15 or 0 K (default 298.15).","type":["number","object"],"additionalProperties":false,"required":["value"],"properties":{"value":{"type":"number","description":"Numeric value in `unit`."},"unit":{"enum":["J/mol","kJ/mol","kcal/mol","eV","cm-1"],"default":"kJ/mol","description":"Unit of `value`. Default kJ/mol."},"temperature":{"enum":[298.15,0],"default":298.15,"description":"Reference temperature of the value, K: 298.15 or 0. Default 298.15."}}},"accepted_warnings":{"title":"a non-empty list of {code, reason}","description":"Warnings of this species accepted in writing: each names the stable code of one warning (as printed in [brackets]) and why it is acceptable. An accepted warning is neither printed nor turned into an error by --strict; an entry that matches no warning is itself warned about (stale-accepted-warning). Never part of the normalised input (no effect on the numbers or the cache).","type":"array","minItems":1,"items":{"$ref":"#/$defs/acceptedWarning"}},"sources":{"title":"a non-empty list of texts","description":"Where every number comes from (free text, one entry per source). Required and non-empty.","type":"array","minItems":1,"items":{"type":"string","pattern":"\\S","title":"a non-blank text","description":"One source citation."}},"structure":{"description":"Which partition-function model applies: atom (translation + electronic levels), diatomic (full rovibrational level sum per electronic state), linear or nonlinear (rigid rotor + harmonic oscillators).","enum":["atom","diatomic","linear","nonlinear"]},"symmetry_number":{"$ref":"#/$defs/positiveInteger","description":"Rotational symmetry number sigma. Required for all structures but atoms (which must not give one)."},"electronic_levels":{"title":"a non-empty list of {energy, degeneracy, term?}","description":"Electronic levels (atom, linear, nonlinear). Default: one non-degenerate ground level, [{energy: 0, degeneracy: 1}]. The lowest level must be at energy 0.","type":"array","minItems":1,"items":{"$ref":"#/$defs/electronicLevel"},"default":[{"energy":0,"degeneracy":1}]},"rotational_constants":{"title":"a list of 1 (linear) or 3 (nonlinear) rotational constants","description":"Rotational constants: [B] for linear, [A, B, C] for nonlinear (conventionally A >= B >= C). Give either this or moments_of_inertia.","type":"array","minItems":1,"maxItems":3,"items":{"$ref":"#/$defs/rotationalConstant"}},"moments_of_inertia":{"title":"a list of 1 (linear) or 3 (nonlinear) moments of inertia","description":"Principal moments of inertia, alternative to rotational_constants: [I] for linear, [IA, IB, IC] for nonlinear; converted with B = h/(8 pi^2 c I).","type":"array","minItems":1,"maxItems":3,"items":{"$ref":"#/$defs/momentOfInertia"}},"geometry":{"title":"a list of atoms [symbol, x, y, z] (angstrom), one row per atom","description":"Optional (linear, nonlinear): Cartesian geometry in angstrom. Symbols are elements (their most abundant isotope), isotopes with the mass number first (13C, 18O, 2H) or D, T. The rotational constants, the linear/nonlinear check, the symmetry number (when symmetry_number is absent) and internal rotors given by axis follow from it; the atoms must match composition. Give at most one of geometry and geometry_file.","type":"array","minItems":2,"items":{"$ref":"#/$defs/geometryRow"}},"geometry_file":{"title":"the name of an XYZ file next to the species file","description":"Optional (linear, nonlinear): like geometry, read from an XYZ file (atom count, comment line, then one 'symbol x y z' line per atom, angstrom) in the species file's folder or below it.","type":"string","minLength":1,"pattern":"^[^/\\\\].*\\.xyz$"},"optical_isomers":{"$ref":"#/$defs/positiveInteger","description":"Optional (linear, nonlinear): number of optical isomers (enantiomers) of the species, 2 for a chiral molecule; adds R ln(optical_isomers) to S. Default 1."},"vibrations":{"title":"a non-empty list of vibrations","description":"Harmonic vibrations (linear, nonlinear): each a wavenumber (bare number in cm-1, or {value, unit}) or {wavenumber, degeneracy}. 3N-5 (linear) or 3N-6 (nonlinear) modes counting degeneracy (internal_rotors count as modes).","type":"array","minItems":1,"items":{"$ref":"#/$defs/vibration"}},"internal_rotors":{"title":"a non-empty list of hindered internal rotors","description":"Optional (linear, nonlinear): torsions treated as one-dimensional hindered internal rotors, summed over their quantum levels, instead of harmonic vibrations. A torsion listed here must be removed from vibrations (each rotor counts as one of the 3N-6 modes; README: finding the torsion among the frequencies).","type":"array","minItems":1,"items":{"$ref":"#/$defs/internalRotor"}},"vibration_scale_factor":{"$ref":"#/$defs/vibrationScaleFactor","description":"Optional (linear, nonlinear): a scale factor applied to every wavenumber in vibrations (e.g. for harmonic frequencies of a quantum-chemistry method), with its source; recorded in the model summary. Accepted range 0.75-1.25."},"anharmonicity":{"$ref":"#/$defs/anharmonicity","description":"Optional (linear, nonlinear): anharmonic constants; with them the wavenumbers of vibrations are harmonic omega_i, the rotational constants those of the vibrational ground state, and the vibrational partition function a direct sum over the levels G(v) = sum omega_i (v_i + d_i/2) + sum_{i<=j} x_ij (v_i + d_i/2)(v_j + d_j/2) + sum g_tt' l_t l_t'."},"centrifugal_distortion":{"$ref":"#/$defs/centrifugalDistortion","description":"Optional (linear, nonlinear): quartic centrifugal distortion constants of the ground state, applied as the first-order classical correction to the rotor partition function. Linear: {DJ}; nonlinear: Watson A reduction {DJ, DJK, DK, dJ, dK} (I^r: z = a axis)."},"conformers":{"title":"a non-empty list of conformers {name, energy, symmetry_number, rotational_constants, vibrations, ...}","description":"Optional (linear, nonlinear): several conformers of one species, each with its own molecular constants and its energy above the lowest conformer; the partition function is their Boltzmann-weighted sum. With conformers the molecular fields (symmetry_number, rotational_constants, moments_of_inertia, vibrations, internal_rotors, electronic_levels, vibration_scale_factor, anharmonicity, centrifugal_distortion, dissociation_energy) go into each conformer, not at the species level.","type":"array","minItems":1,"items":{"$ref":"#/$defs/conformer"}},"dissociation_energy":{"$ref":"#/$defs/positiveEnergy","description":"Diatomic, required: D0 of the ground state from its lowest level (v=0, J=0); defines the dissociation limit where the level sums stop (cm-1 when a bare number). Linear and nonlinear, optional, only with anharmonicity: the cut of the anharmonic vibrational level sum above the lowest level."},"nuclear_spin_weights":{"title":"{even, odd} whole numbers >= 0, not both 0","description":"Homonuclear diatomic only, optional: statistical weights of even-J and odd-J rotational levels. When given they replace the symmetry number.","type":"object","additionalProperties":false,"required":["even","odd"],"properties":{"even":{"type":"integer","minimum":0,"description":"Weight of even-J levels."},"odd":{"type":"integer","minimum":0,"description":"Weight of odd-J levels."}}},"nuclear_spin_mixture":{"title":"one of equilibrium, frozen","description":"Homonuclear diatomic with nuclear_spin_weights only, optional (default equilibrium): how the even-J and odd-J manifolds are populated. equilibrium: one Boltzmann distribution over all levels (ortho/para interconversion at every T); this reproduces NIST-JANAF 4th ed. H2 (H-050) and CODATA, e.g. Cp(200 K) within 0.01 J/(mol K), and is the default so tables stay comparable with them. frozen: fixed mole fractions even/(even+odd) and odd/(even+odd) (normal hydrogen 1:3, as H2 stays without a conversion catalyst when cooled from room temperature), each manifold in its own Boltzmann distribution; for H2 it is 0.17 J/(mol K) lower in Cp at 200 K than equilibrium and JANAF, and agrees with equilibrium within 1e-5 relative from 500 to 6000 K.","enum":["equilibrium","frozen"],"default":"equilibrium"},"electronic_states":{"title":"a non-empty list of electronic states, ground state first","description":"Diatomic only, required: electronic states with their spectroscopic constants, ground state first.","type":"array","minItems":1,"items":{"$ref":"#/$defs/electronicState"}},"uncertainties":{"title":"standard uncertainties of the inputs (all optional; none = zero)","description":"Optional standard uncertainties (one standard deviation) of the model inputs, propagated linearly to u(Cp), u(S), u(H-H298) and u(H) at 298.15, 1000 and 2000 K (thermo.json, report.html). Every key is optional; a missing key means that input is taken as exact (u = 0), and a species without `uncertainties` reports zero uncertainties. Relative figures are fractions (0.01 = 1 %). Inputs are treated as independent, except `scale_factor`, which moves all vibrations together.","type":"object","additionalProperties":false,"properties":{"vibrations":{"title":"a fraction for every vibration, or a list in cm-1 per entry of `vibrations`","description":"Uncertainty of each vibration wavenumber (independent per entry): one relative figure for all entries, or a list of absolute uncertainties in cm-1, one per entry of `vibrations` (a degenerate entry moves as one). Diatomics: applies to we of every electronic state.","anyOf":[{"type":"number","minimum":0,"maximum":1},{"type":"array","items":{"type":"number","minimum":0}}]},"scale_factor":{"description":"Relative uncertainty of the vibrational scale factor: all wavenumbers move together by this fraction (fully correlated).","type":"number","minimum":0,"maximum":1},"rotational_constants":{"description":"Relative uncertainty of each rotational constant (independent per constant). With moments of inertia or a geometry as input, state the uncertainty of the rotational constants derived from them. Diatomics: Be of every electronic state.","type":"number","minimum":0,"maximum":1},"electronic_energies":{"description":"Uncertainty of each excited electronic level energy (or diatomic state Te), cm-1, independent per level.","type":"number","minimum":0},"barriers":{"description":"Relative uncertainty of each hindered-rotor barrier V0 (independent per rotor).","type":"number","minimum":0,"maximum":1},"anharmonic_constants":{"description":"Relative uncertainty of each anharmonic constant x_ij (polyatomics with `anharmonicity`) or wexe (diatomics), independent per constant.","type":"number","minimum":0,"maximum":1},"enthalpy_of_formation":{"description":"Standard uncertainty of the enthalpy of formation: a number in kJ/mol or {value, unit} with unit J/mol, kJ/mol, kcal/mol.","type":["number","object"],"minimum":0,"additionalProperties":false,"required":["value"],"properties":{"value":{"type":"number","minimum":0,"description":"Standard uncertainty in `unit`."},"unit":{"enum":["J/mol","kJ/mol","kcal/mol"],"default":"kJ/mol","description":"Unit of `value`. Default kJ/mol."}}},"molar_mass":{"description":"Relative uncertainty of the molar mass (rarely needed: atomic weights are known to better than 1e-4; isotopic mixtures).","type":"number","minimum":0,"maximum":1}}},"temperature_ranges":{"title":"{low?, mid?, high?} in K","description":"Optional per-species override of the fit ranges [low, mid] and [mid, high], K. Missing keys come from the database settings.","type":"object","additionalProperties":false,"minProperties":1,"properties":{"low":{"type":"number","exclusiveMinimum":0,"description":"Lowest fit temperature, K."},"mid":{"type":"number","exclusiveMinimum":0,"description":"Common temperature of the two ranges, K."},"high":{"type":"number","exclusiveMinimum":0,"description":"Highest fit temperature, K."}}},"tolerances":{"title":"{cp?, h?, s?, relative_to_cp?: {cp?, h?, s?}}","description":"Optional per-species fit limits, same keys as tolerances in qforge.yaml: the limit of q = cp, h, s at T is max(q, relative_to_cp.q × Cp/R(T)). Missing keys come from the database settings.","type":"object","additionalProperties":false,"minProperties":1,"properties":{"cp":{"type":"number","exclusiveMinimum":0,"description":"Absolute part of the Cp/R limit (dimensionless)."},"h":{"type":"number","exclusiveMinimum":0,"description":"Absolute part of the H/RT limit (dimensionless)."},"s":{"type":"number","exclusiveMinimum":0,"description":"Absolute part of the S/R limit (dimensionless)."},"relative_to_cp":{"type":"object","additionalProperties":false,"minProperties":1,"description":"Multiples of the computed Cp/R.","properties":{"cp":{"type":"number","minimum":0,"description":"Size-scaled part of the Cp/R limit: a multiple of the computed Cp/R."},"h":{"type":"number","minimum":0,"description":"Size-scaled part of the H/RT limit: a multiple of the computed Cp/R."},"s":{"type":"number","minimum":0,"description":"Size-scaled part of the S/R limit: a multiple of the computed Cp/R."}}}}}},"allOf":[{"if":{"properties":{"structure":{"const":"atom"}},"required":["structure"]},"then":{"title":"structure 'atom'","properties":{"symmetry_number":false,"rotational_constants":false,"moments_of_inertia":false,"vibrations":false,"dissociation_energy":false,"nuclear_spin_weights":false,"nuclear_spin_mixture":false,"electronic_states":false,"internal_rotors":false,"vibration_scale_factor":false,"anharmonicity":false,"centrifugal_distortion":false,"conformers":false,"geometry":false,"geometry_file":false,"optical_isomers":false}}},{"if":{"properties":{"structure":{"const":"diatomic"}},"required":["structure"]},"then":{"title":"structure 'diatomic'","required":["symmetry_number","dissociation_energy","electronic_states"],"properties":{"electronic_levels":false,"rotational_constants":false,"moments_of_inertia":false,"vibrations":false,"internal_rotors":false,"vibration_scale_factor":false,"anharmonicity":false,"centrifugal_distortion":false,"conformers":false,"geometry":false,"geometry_file":false,"optical_isomers":false}}},{"if":{"properties":{"structure":{"const":"linear"}},"required":["structure"]},"then":{"title":"structure 'linear'","properties":{"nuclear_spin_weights":false,"nuclear_spin_mixture":false,"electronic_states":false},"if":{"required":["conformers"]},"then":{"title":"structure 'linear' with conformers","properties":{"symmetry_number":false,"rotational_constants":false,"moments_of_inertia":false,"vibrations":false,"internal_rotors":false,"electronic_levels":false,"vibration_scale_factor":false,"anharmonicity":false,"centrifugal_distortion":false,"dissociation_energy":false,"geometry":false,"geometry_file":false}},"else":{"title":"structure 'linear'","required":["vibrations"]}}},{"if":{"properties":{"structure":{"const":"nonlinear"}},"required":["structure"]},"then":{"title":"structure 'nonlinear'","properties":{"nuclear_spin_weights":false,"nuclear_spin_mixture":false,"electronic_states":false},"if":{"required":["conformers"]},"then":{"title":"structure 'nonlinear' with conformers","properties":{"symmetry_number":false,"rotational_constants":false,"moments_of_inertia":false,"vibrations":false,"internal_rotors":false,"electronic_levels":false,"vibration_scale_factor":false,"anharmonicity":false,"centrifugal_distortion":false,"dissociation_energy":false,"geometry":false,"geometry_file":false}},"else":{"title":"structure 'nonlinear'","required":["vibrations"]}}}],"$defs":{"acceptedWarning":{"title":"{code, reason}","description":"One accepted warning: its stable code and the reason a person accepts it.","type":"object","additionalProperties":false,"required":["code","reason"],"properties":{"code":{"type":"string","pattern":"^[a-z0-9]+(-[a-z0-9]+)*$","title":"a diagnostic code in lower kebab-case, e.g. enthalpy-at-0k","description":"Stable code of the accepted warning, as printed in [brackets] after the message."},"reason":{"type":"string","minLength":10,"title":"why the warning is accepted (at least 10 characters)","description":"Why a person accepts this warning for this species; a placeholder (todo, n/a, ...) is an error."}}},"energy":{"title":"a number in cm-1, or {value, unit}","description":"An energy or wavenumber of any sign. A bare number is in cm-1; or {value, unit} with unit one of cm-1, eV, K, J/mol, kJ/mol, kcal/mol (per particle for cm-1, eV, K; per mole for the molar units).","type":["number","object"],"properties":{"value":{"type":"number","description":"Numeric value in `unit`."},"unit":{"description":"Unit of `value`.","enum":["cm-1","eV","K","J/mol","kJ/mol","kcal/mol"]}},"required":["value","unit"],"additionalProperties":false},"nonNegativeEnergy":{"title":"a number >= 0 in cm-1, or {value, unit} with value >= 0","description":"An energy or wavenumber, zero or positive. A bare number is in cm-1; or {value, unit} with unit one of cm-1, eV, K, J/mol, kJ/mol, kcal/mol (per particle for cm-1, eV, K; per mole for the molar units).","type":["number","object"],"minimum":0,"properties":{"value":{"type":"number","description":"Numeric value in `unit`.","minimum":0},"unit":{"description":"Unit of `value`.","enum":["cm-1","eV","K","J/mol","kJ/mol","kcal/mol"]}},"required":["value","unit"],"additionalProperties":false},"positiveEnergy":{"title":"a number > 0 in cm-1, or {value, unit} with value > 0","description":"An energy or wavenumber, strictly positive. A bare number is in cm-1; or {value, unit} with unit one of cm-1, eV, K, J/mol, kJ/mol, kcal/mol (per particle for cm-1, eV, K; per mole for the molar units).","type":["number","object"],"exclusiveMinimum":0,"properties":{"value":{"type":"number","description":"Numeric value in `unit`.","exclusiveMinimum":0},"unit":{"description":"Unit of `value`.","enum":["cm-1","eV","K","J/mol","kJ/mol","kcal/mol"]}},"required":["value","unit"],"additionalProperties":false},"rotationalConstant":{"title":"a number > 0 in cm-1, or {value, unit} with value > 0","description":"A rotational constant, strictly positive. A bare number is in cm-1; or {value, unit} with unit one of cm-1, eV, K, J/mol, kJ/mol, kcal/mol, MHz, GHz.","type":["number","object"],"exclusiveMinimum":0,"properties":{"value":{"type":"number","description":"Numeric value in `unit`.","exclusiveMinimum":0},"unit":{"description":"Unit of `value`.","enum":["cm-1","eV","K","J/mol","kJ/mol","kcal/mol","MHz","GHz"]}},"required":["value","unit"],"additionalProperties":false},"rotationalTerm":{"title":"a number in cm-1, or {value, unit}","description":"A rotational-type constant of any sign (e.g. alphae). A bare number is in cm-1; or {value, unit} with unit one of cm-1, eV, K, J/mol, kJ/mol, kcal/mol, MHz, GHz.","type":["number","object"],"properties":{"value":{"type":"number","description":"Numeric value in `unit`."},"unit":{"description":"Unit of `value`.","enum":["cm-1","eV","K","J/mol","kJ/mol","kcal/mol","MHz","GHz"]}},"required":["value","unit"],"additionalProperties":false},"nonNegativeRotationalTerm":{"title":"a number >= 0 in cm-1, or {value, unit} with value >= 0","description":"A rotational-type constant, zero or positive (e.g. the centrifugal distortion De). A bare number is in cm-1; or {value, unit} with unit one of cm-1, eV, K, J/mol, kJ/mol, kcal/mol, MHz, GHz.","type":["number","object"],"minimum":0,"properties":{"value":{"type":"number","description":"Numeric value in `unit`.","minimum":0},"unit":{"description":"Unit of `value`.","enum":["cm-1","eV","K","J/mol","kJ/mol","kcal/mol","MHz","GHz"]}},"required":["value","unit"],"additionalProperties":false},"momentOfInertia":{"title":"a number > 0 in amu*angstrom^2, or {value, unit} with value > 0","description":"A principal moment of inertia, strictly positive. A bare number is in amu*angstrom^2; or {value, unit} with unit one of amu*angstrom^2, kg*m^2, g*cm^2.","type":["number","object"],"exclusiveMinimum":0,"properties":{"value":{"type":"number","description":"Numeric value in `unit`.","exclusiveMinimum":0},"unit":{"description":"Unit of `value`.","enum":["amu*angstrom^2","kg*m^2","g*cm^2"]}},"required":["value","unit"],"additionalProperties":false},"positiveInteger":{"type":"integer","minimum":1,"title":"a whole number >= 1","description":"A whole number, at least 1."},"electronicLevel":{"title":"an electronic level {energy, degeneracy, term?}","description":"One electronic level of an atom or polyatomic molecule.","type":"object","additionalProperties":false,"required":["energy","degeneracy"],"properties":{"energy":{"$ref":"#/$defs/nonNegativeEnergy","description":"Term energy above the lowest level (cm-1 when a bare number). The lowest level must be at 0."},"degeneracy":{"$ref":"#/$defs/positiveInteger","description":"Degeneracy g of the level (2J+1 for an atomic level)."},"term":{"type":"string","minLength":1,"description":"Optional term symbol or label, e.g. '3P2'; for documentation only."}}},"wavenumber":{"title":"a wavenumber > 0 in cm-1, or {value, unit} with value > 0","description":"A vibrational wavenumber, strictly positive. A bare number is in cm-1; or {value, unit} with unit one of cm-1, eV, K, J/mol, kJ/mol, kcal/mol (per particle for cm-1, eV, K; per mole for the molar units).","type":["number","object"],"exclusiveMinimum":0,"properties":{"value":{"type":"number","description":"Numeric value in `unit`.","exclusiveMinimum":0},"unit":{"description":"Unit of `value`.","enum":["cm-1","eV","K","J/mol","kJ/mol","kcal/mol"]}},"required":["value","unit"],"additionalProperties":false},"vibration":{"title":"a wavenumber > 0 in cm-1, {value, unit}, or {wavenumber, degeneracy} (e.g. 1333, {value: 1333, unit: cm-1}, {wavenumber: {value: 667, unit: cm-1}, degeneracy: 2})","description":"One harmonic vibration: a fundamental wavenumber (a bare number in cm-1, or {value, unit}; degeneracy 1), or {wavenumber, degeneracy} with the wavenumber itself a bare number in cm-1 or {value, unit}.","oneOf":[{"$ref":"#/$defs/wavenumber"},{"title":"{wavenumber, degeneracy}","description":"A vibration with its degeneracy.","type":"object","additionalProperties":false,"required":["wavenumber"],"properties":{"wavenumber":{"$ref":"#/$defs/wavenumber","description":"Fundamental wavenumber (cm-1 when a bare number)."},"degeneracy":{"$ref":"#/$defs/positiveInteger","description":"Number of modes sharing this wavenumber. Default 1.","default":1}}}]},"electronicState":{"title":"a diatomic electronic state {term, energy, degeneracy, we, Be, ...}","description":"One electronic state of a diatomic molecule with its spectroscopic constants (Huber & Herzberg notation). Term values E(v,J) = Te + G(v) + B_v x - D_v x^2 + H_v x^3 with x = J(J+1), G(v) = we(v+1/2) - wexe(v+1/2)^2 + weye(v+1/2)^3 + weze(v+1/2)^4, B_v = Be - alphae(v+1/2) + gammae(v+1/2)^2, D_v = De + betae(v+1/2), H_v = He; the higher-order constants weze, gammae, betae, He are optional (0 when absent).","type":"object","additionalProperties":false,"required":["term","energy","degeneracy","we","Be"],"properties":{"term":{"type":"string","minLength":1,"description":"Term symbol or label, e.g. 'X1Sigma_g+'."},"energy":{"$ref":"#/$defs/nonNegativeEnergy","description":"Te: energy of the potential minimum above the ground-state minimum (cm-1 when a bare number). 0 for the ground state, which must come first."},"degeneracy":{"$ref":"#/$defs/positiveInteger","description":"Electronic degeneracy: spin multiplicity times 2 for Lambda > 0."},"we":{"$ref":"#/$defs/positiveEnergy","description":"Harmonic wavenumber omega_e (cm-1 when a bare number)."},"wexe":{"$ref":"#/$defs/energy","description":"Anharmonicity omega_e x_e (cm-1 when a bare number). Default 0.","default":0},"weye":{"$ref":"#/$defs/energy","description":"Second anharmonicity omega_e y_e (cm-1 when a bare number). Default 0.","default":0},"weze":{"$ref":"#/$defs/energy","description":"Third anharmonicity omega_e z_e (cm-1 when a bare number): adds + weze(v+1/2)^4 to G(v). Optional; default 0 (then G(v) has three terms). Huber & Herzberg (1979) notation.","default":0},"Be":{"$ref":"#/$defs/rotationalConstant","description":"Equilibrium rotational constant B_e (cm-1 when a bare number)."},"alphae":{"$ref":"#/$defs/rotationalTerm","description":"Vibration-rotation coupling alpha_e (cm-1 when a bare number). Default 0.","default":0},"gammae":{"$ref":"#/$defs/rotationalTerm","description":"Second vibration-rotation constant gamma_e (cm-1 when a bare number): B_v = Be - alphae(v+1/2) + gammae(v+1/2)^2. Either sign; usually a few percent of alphae or less. Optional; default 0.","default":0},"De":{"$ref":"#/$defs/nonNegativeRotationalTerm","description":"Centrifugal distortion constant D_e (cm-1 when a bare number). Default 0.","default":0},"betae":{"$ref":"#/$defs/rotationalTerm","description":"Vibrational dependence of the centrifugal distortion beta_e (cm-1 when a bare number): D_v = De + betae(v+1/2). Either sign; usually a few percent of De or less, and D_0 = De + betae/2 may not be negative. Optional; default 0.","default":0},"He":{"$ref":"#/$defs/rotationalTerm","description":"Sextic centrifugal distortion constant H_e (cm-1 when a bare number): adds + He J^3(J+1)^3 to every level (H_v = He for all v; Huber & Herzberg sign convention; its sign is usually that of 12 Be^2 - alphae we, the estimate H_e = 2De(12Be^2 - alphae we)/(3we^2) of Herzberg 1950). Optional; default 0. With He > 0 the J ladders may no longer turn over below the dissociation limit.","default":0},"dissociation_energy":{"$ref":"#/$defs/positiveEnergy","description":"D0 of this state from its own lowest level (cm-1 when a bare number). When absent the state shares the molecule's dissociation limit."}}},"internalRotor":{"title":"a hindered internal rotor {axis | moment_of_inertia | rotational_constant, barrier | potential, symmetry_number?, top?, foldedness?}","description":"One torsion as a one-dimensional hindered rotor H = B(-d^2/dphi^2) + V(phi), B = h/(8 pi^2 c I_red), levels from a direct diagonalisation in the free-rotor basis. The reduced moment: from the geometry (axis, top) by Pitzer's I(2,3), or given as moment_of_inertia or rotational_constant (exactly one of the three). The potential: barrier (+ foldedness), or potential {barrier, foldedness} | {fourier, unit} | {scan, unit} (exactly one of barrier and potential).","type":"object","additionalProperties":false,"required":[],"properties":{"axis":{"title":"two 1-based atom indices [i, j] of a bond in the geometry","description":"The torsion bond, as 1-based indices into geometry (the two atoms must be bonded). Needs geometry or geometry_file; the reduced moment of inertia then follows from the geometry.","type":"array","minItems":2,"maxItems":2,"items":{"$ref":"#/$defs/positiveInteger"}},"top":{"title":"a non-empty list of 1-based atom indices","description":"With axis, optional: the atoms that turn (one whole side of the bond; the axis atom may be left out). Default: the side with fewer atoms.","type":"array","minItems":1,"items":{"$ref":"#/$defs/positiveInteger"}},"barrier":{"$ref":"#/$defs/nonNegativeEnergy","description":"Barrier height V0 of the potential (V0/2)(1 - cos n phi), >= 0 (cm-1 when a bare number; 0 gives a free rotor). Alternative to potential."},"symmetry_number":{"$ref":"#/$defs/positiveInteger","description":"Symmetry number sigma of the internal rotor (3 for a CH3 top, 1 for an OH top): the levels of the full turn are divided by it. Also the foldedness n when foldedness is not given. Required unless axis is given (then it follows from the geometry: lcm of the rotation symmetry of the two sides about the axis)."},"foldedness":{"$ref":"#/$defs/positiveInteger","description":"Foldedness n: number of potential minima per full turn. Default: symmetry_number. Differs from it for a torsion of distinguishable wells, e.g. n = 2 with symmetry_number 1 for the two mirror-image wells of H2O2."},"moment_of_inertia":{"$ref":"#/$defs/momentOfInertia","description":"Reduced moment of inertia I_red of the torsion (amu*angstrom^2 when a bare number; e.g. I1 I2/(I1 + I2) for two coaxial tops, or Pitzer's reduced moment). Alternative to rotational_constant."},"rotational_constant":{"$ref":"#/$defs/rotationalConstant","description":"Reduced rotational constant B = h/(8 pi^2 c I_red) of the torsion (cm-1 when a bare number). Alternative to moment_of_inertia."},"potential":{"$ref":"#/$defs/torsionPotential","description":"The torsional potential V(phi). Alternative to barrier."}}},"vibrationScaleFactor":{"title":"{value, source}","description":"A vibrational scale factor and where it comes from.","type":"object","additionalProperties":false,"required":["value","source"],"properties":{"value":{"type":"number","exclusiveMinimum":0,"description":"The factor every wavenumber is multiplied by (dimensionless)."},"source":{"type":"string","pattern":"\\S","description":"Where the factor comes from (method, basis set, citation)."}}},"anharmonicTerm":{"title":"[i, j, value]: two mode numbers >= 1 (i <= j) and a number in cm-1","type":"array","minItems":3,"maxItems":3,"prefixItems":[{"$ref":"#/$defs/positiveInteger"},{"$ref":"#/$defs/positiveInteger"},{"type":"number"}],"items":false,"description":"One anharmonic constant: 1-based mode indices i <= j into vibrations and the value in cm-1."},"anharmonicity":{"title":"{x, g?, alpha?}","description":"Anharmonic constants of a polyatomic, cm-1.","type":"object","additionalProperties":false,"required":["x"],"properties":{"x":{"title":"a list of [i, j, x_ij]","description":"x_ij in cm-1 with 1-based mode indices into vibrations, i <= j, each pair at most once.","type":"array","items":{"$ref":"#/$defs/anharmonicTerm"}},"g":{"title":"a list of [t, t', g_tt']","description":"g_tt' in cm-1 of doubly degenerate modes t <= t' (vibrational angular momentum, + g_tt' l_t l_t'). Default none.","type":"array","items":{"$ref":"#/$defs/anharmonicTerm"},"default":[]},"alpha":{"title":"one list per vibration: [alpha_B] (linear) or [alpha_A, alpha_B, alpha_C] (nonlinear)","description":"Optional vibration-rotation constants in cm-1, one entry per item of vibrations: B_v = B_0 - sum alpha_i v_i.","type":"array","minItems":1,"items":{"title":"[alpha_B] or [alpha_A, alpha_B, alpha_C]","type":"array","minItems":1,"maxItems":3,"items":{"type":"number"}}}}},"centrifugalDistortion":{"title":"{DJ, DJK?, DK?, dJ?, dK?} in cm-1","description":"Quartic centrifugal distortion constants of the vibrational ground state, cm-1.","type":"object","additionalProperties":false,"required":["DJ"],"properties":{"DJ":{"type":"number","description":"D_J (linear) or Delta_J (nonlinear, Watson A), cm-1."},"DJK":{"type":"number","description":"Delta_JK (Watson A), cm-1; nonlinear only."},"DK":{"type":"number","description":"Delta_K (Watson A), cm-1; nonlinear only."},"dJ":{"type":"number","description":"delta_J (Watson A), cm-1; nonlinear only."},"dK":{"type":"number","description":"delta_K (Watson A), cm-1; nonlinear only."}}},"conformer":{"title":"a conformer {name, energy, symmetry_number, rotational_constants | moments_of_inertia, vibrations, ...}","description":"One conformer: its energy and the molecular fields of a linear or nonlinear species.","type":"object","additionalProperties":false,"required":["name","energy","vibrations"],"properties":{"name":{"type":"string","minLength":1,"description":"Label of the conformer (unique within the species)."},"energy":{"$ref":"#/$defs/nonNegativeEnergy","description":"Energy of this conformer's lowest level (its zero-point level) above that of the lowest conformer (cm-1 when a bare number); the lowest conformer has 0."},"symmetry_number":{"$ref":"#/$defs/positiveInteger","description":"Rotational symmetry number sigma of this conformer. Required unless a geometry is given (then it follows from the geometry)."},"rotational_constants":{"title":"a list of 1 (linear) or 3 (nonlinear) rotational constants","description":"Rotational constants: [B] for linear, [A, B, C] for nonlinear (conventionally A >= B >= C). Give either this or moments_of_inertia.","type":"array","minItems":1,"maxItems":3,"items":{"$ref":"#/$defs/rotationalConstant"}},"moments_of_inertia":{"title":"a list of 1 (linear) or 3 (nonlinear) moments of inertia","description":"Principal moments of inertia, alternative to rotational_constants: [I] for linear, [IA, IB, IC] for nonlinear; converted with B = h/(8 pi^2 c I).","type":"array","minItems":1,"maxItems":3,"items":{"$ref":"#/$defs/momentOfInertia"}},"geometry":{"title":"a list of atoms [symbol, x, y, z] (angstrom), one row per atom","description":"Optional (linear, nonlinear): Cartesian geometry in angstrom. Symbols are elements (their most abundant isotope), isotopes with the mass number first (13C, 18O, 2H) or D, T. The rotational constants, the linear/nonlinear check, the symmetry number (when symmetry_number is absent) and internal rotors given by axis follow from it; the atoms must match composition. Give at most one of geometry and geometry_file.","type":"array","minItems":2,"items":{"$ref":"#/$defs/geometryRow"}},"geometry_file":{"title":"the name of an XYZ file next to the species file","description":"Optional (linear, nonlinear): like geometry, read from an XYZ file (atom count, comment line, then one 'symbol x y z' line per atom, angstrom) in the species file's folder or below it.","type":"string","minLength":1,"pattern":"^[^/\\\\].*\\.xyz$"},"vibrations":{"title":"a non-empty list of vibrations","description":"Harmonic vibrations (linear, nonlinear): each a wavenumber (bare number in cm-1, or {value, unit}) or {wavenumber, degeneracy}. 3N-5 (linear) or 3N-6 (nonlinear) modes counting degeneracy (internal_rotors count as modes).","type":"array","minItems":1,"items":{"$ref":"#/$defs/vibration"}},"internal_rotors":{"title":"a non-empty list of hindered internal rotors {barrier, symmetry_number, foldedness?, moment_of_inertia | rotational_constant}","description":"Optional (linear, nonlinear): torsions treated as one-dimensional hindered internal rotors with potential V(phi) = (V0/2)(1 - cos n phi), summed over their quantum levels, instead of harmonic vibrations. A torsion listed here must be removed from vibrations (each rotor counts as one of the 3N-6 modes).","type":"array","minItems":1,"items":{"$ref":"#/$defs/internalRotor"}},"electronic_levels":{"title":"a non-empty list of {energy, degeneracy, term?}","description":"Electronic levels (atom, linear, nonlinear). Default: one non-degenerate ground level, [{energy: 0, degeneracy: 1}]. The lowest level must be at energy 0.","type":"array","minItems":1,"items":{"$ref":"#/$defs/electronicLevel"},"default":[{"energy":0,"degeneracy":1}]},"vibration_scale_factor":{"$ref":"#/$defs/vibrationScaleFactor","description":"Optional (linear, nonlinear): a scale factor applied to every wavenumber in vibrations (e.g. for harmonic frequencies of a quantum-chemistry method), with its source; recorded in the model summary. Accepted range 0.75-1.25."},"anharmonicity":{"$ref":"#/$defs/anharmonicity","description":"Optional (linear, nonlinear): anharmonic constants; with them the wavenumbers of vibrations are harmonic omega_i, the rotational constants those of the vibrational ground state, and the vibrational partition function a direct sum over the levels G(v) = sum omega_i (v_i + d_i/2) + sum_{i<=j} x_ij (v_i + d_i/2)(v_j + d_j/2) + sum g_tt' l_t l_t'."},"centrifugal_distortion":{"$ref":"#/$defs/centrifugalDistortion","description":"Optional (linear, nonlinear): quartic centrifugal distortion constants of the ground state, applied as the first-order classical correction to the rotor partition function. Linear: {DJ}; nonlinear: Watson A reduction {DJ, DJK, DK, dJ, dK} (I^r: z = a axis)."},"dissociation_energy":{"$ref":"#/$defs/positiveEnergy","description":"Diatomic, required: D0 of the ground state from its lowest level (v=0, J=0); defines the dissociation limit where the level sums stop (cm-1 when a bare number). Linear and nonlinear, optional, only with anharmonicity: the cut of the anharmonic vibrational level sum above the lowest level."}}},"geometryRow":{"title":"[symbol, x, y, z] with x, y, z in angstrom","description":"One atom: element or isotope symbol (C, 13C, D) and Cartesian coordinates in angstrom.","type":"array","minItems":4,"maxItems":4,"prefixItems":[{"type":"string","pattern":"^([0-9]{1,3})?[A-Z][a-z]{0,2}$","title":"an element or isotope symbol"},{"type":"number"},{"type":"number"},{"type":"number"}]},"torsionPotential":{"title":"{barrier, foldedness?} or {fourier: [[n, V_cos, V_sin], ...], unit?} or {scan: [[angle_deg, energy], ...], unit?}","description":"A torsional potential: {barrier, foldedness?} is (V0/2)(1 - cos n phi); {fourier} is V(phi) = sum V_cos (1 - cos n phi)/2 + V_sin sin(n phi)/2; {scan} is a relaxed scan [angle in degrees, energy] fitted to a Fourier series in multiples of the rotor symmetry number (the scan must cover the period 360/symmetry_number). unit (default cm-1) applies to V_cos, V_sin and scan energies.","type":"object","additionalProperties":false,"properties":{"barrier":{"$ref":"#/$defs/nonNegativeEnergy","description":"Barrier height V0 (cm-1 when a bare number)."},"foldedness":{"$ref":"#/$defs/positiveInteger","description":"Foldedness n of the barrier form. Default: the rotor symmetry number."},"fourier":{"type":"array","minItems":1,"title":"a non-empty list of [n, V_cos, V_sin]","description":"Fourier terms [n >= 1, V_cos, V_sin] in unit.","items":{"type":"array","minItems":3,"maxItems":3,"prefixItems":[{"$ref":"#/$defs/positiveInteger"},{"type":"number"},{"type":"number"}]}},"scan":{"type":"array","minItems":5,"title":"at least 5 points [angle_deg, energy]","description":"Scan points [torsion angle in degrees, energy in unit]; the energy zero is arbitrary.","items":{"type":"array","minItems":2,"maxItems":2,"prefixItems":[{"type":"number"},{"type":"number"}]}},"unit":{"enum":["cm-1","eV","K","J/mol","kJ/mol","kcal/mol"],"default":"cm-1","description":"Unit of V_cos, V_sin and scan energies. Default cm-1."}},"oneOf":[{"required":["barrier"],"title":"the barrier form"},{"required":["fourier"],"title":"the fourier form"},{"required":["scan"],"title":"the scan form"}]}}};
const schema32 = {"type":"integer","minimum":1,"title":"a whole number >= 1","description":"A whole number, at least 1."};
const schema33 = {"title":"{code, reason}","description":"One accepted warning: its stable code and the reason a person accepts it.","type":"object","additionalProperties":false,"required":["code","reason"],"properties":{"code":{"type":"string","pattern":"^[a-z0-9]+(-[a-z0-9]+)*$","title":"a diagnostic code in lower kebab-case, e.g. enthalpy-at-0k","description":"Stable code of the accepted warning, as printed in [brackets] after the message."},"reason":{"type":"string","minLength":10,"title":"why the warning is accepted (at least 10 characters)","description":"Why a person accepts this warning for this species; a placeholder (todo, n/a, ...) is an error."}}};
const schema38 = {"title":"a number > 0 in cm-1, or {value, unit} with value > 0","description":"A rotational constant, strictly positive. A bare number is in cm-1; or {value, unit} with unit one of cm-1, eV, K, J/mol, kJ/mol, kcal/mol, MHz, GHz.","type":["number","object"],"exclusiveMinimum":0,"properties":{"value":{"type":"number","description":"Numeric value in `unit`.","exclusiveMinimum":0},"unit":{"description":"Unit of `value`.","enum":["cm-1","eV","K","J/mol","kJ/mol","kcal/mol","MHz","GHz"]}},"required":["value","unit"],"additionalProperties":false};
const schema39 = {"title":"a number > 0 in amu*angstrom^2, or {value, unit} with value > 0","description":"A principal moment of inertia, strictly positive. A bare number is in amu*angstrom^2; or {value, unit} with unit one of amu*angstrom^2, kg*m^2, g*cm^2.","type":["number","object"],"exclusiveMinimum":0,"properties":{"value":{"type":"number","description":"Numeric value in `unit`.","exclusiveMinimum":0},"unit":{"description":"Unit of `value`.","enum":["amu*angstrom^2","kg*m^2","g*cm^2"]}},"required":["value","unit"],"additionalProperties":false};
const schema40 = {"title":"[symbol, x, y, z] with x, y, z in angstrom","description":"One atom: element or isotope symbol (C, 13C, D) and Cartesian coordinates in angstrom.","type":"array","minItems":4,"maxItems":4,"prefixItems":[{"type":"string","pattern":"^([0-9]{1,3})?[A-Z][a-z]{0,2}$","title":"an element or isotope symbol"},{"type":"number"},{"type":"number"},{"type":"number"}]};
const schema58 = {"title":"{value, source}","description":"A vibrational scale factor and where it comes from.","type":"object","additionalProperties":false,"required":["value","source"],"properties":{"value":{"type":"number","exclusiveMinimum":0,"description":"The factor every wavenumber is multiplied by (dimensionless)."},"source":{"type":"string","pattern":"\\S","description":"Where the factor comes from (method, basis set, citation)."}}};
const schema63 = {"title":"{DJ, DJK?, DK?, dJ?, dK?} in cm-1","description":"Quartic centrifugal distortion constants of the vibrational ground state, cm-1.","type":"object","additionalProperties":false,"required":["DJ"],"properties":{"DJ":{"type":"number","description":"D_J (linear) or Delta_J (nonlinear, Watson A), cm-1."},"DJK":{"type":"number","description":"Delta_JK (Watson A), cm-1; nonlinear only."},"DK":{"type":"number","description":"Delta_K (Watson A), cm-1; nonlinear only."},"dJ":{"type":"number","description":"delta_J (Watson A), cm-1; nonlinear only."},"dK":{"type":"number","description":"delta_K (Watson A), cm-1; nonlinear only."}}};
const schema72 = {"title":"a number > 0 in cm-1, or {value, unit} with value > 0","description":"An energy or wavenumber, strictly positive. A bare number is in cm-1; or {value, unit} with unit one of cm-1, eV, K, J/mol, kJ/mol, kcal/mol (per particle for cm-1, eV, K; per mole for the molar units).","type":["number","object"],"exclusiveMinimum":0,"properties":{"value":{"type":"number","description":"Numeric value in `unit`.","exclusiveMinimum":0},"unit":{"description":"Unit of `value`.","enum":["cm-1","eV","K","J/mol","kJ/mol","kcal/mol"]}},"required":["value","unit"],"additionalProperties":false};
const func1 = Object.prototype.hasOwnProperty;
const func2 = require("ajv/dist/runtime/ucs2length").default;
const pattern4 = new RegExp("^[A-Za-z0-9()+*,._-]*$", "u");
const pattern5 = new RegExp("^[a-z0-9]+(-[a-z0-9]+)*$", "u");
const pattern6 = new RegExp("\\S", "u");
const pattern7 = new RegExp("^([0-9]{1,3})?[A-Z][a-z]{0,2}$", "u");
const pattern8 = new RegExp("^[^/\\\\].*\\.xyz$", "u");
const schema35 = {"title":"an electronic level {energy, degeneracy, term?}","description":"One electronic level of an atom or polyatomic molecule.","type":"object","additionalProperties":false,"required":["energy","degeneracy"],"properties":{"energy":{"$ref":"#/$defs/nonNegativeEnergy","description":"Term energy above the lowest level (cm-1 when a bare number). The lowest level must be at 0."},"degeneracy":{"$ref":"#/$defs/positiveInteger","description":"Degeneracy g of the level (2J+1 for an atomic level)."},"term":{"type":"string","minLength":1,"description":"Optional term symbol or label, e.g. '3P2'; for documentation only."}}};
const schema36 = {"title":"a number >= 0 in cm-1, or {value, unit} with value >= 0","description":"An energy or wavenumber, zero or positive. A bare number is in cm-1; or {value, unit} with unit one of cm-1, eV, K, J/mol, kJ/mol, kcal/mol (per particle for cm-1, eV, K; per mole for the molar units).","type":["number","object"],"minimum":0,"properties":{"value":{"type":"number","description":"Numeric value in `unit`.","minimum":0},"unit":{"description":"Unit of `value`.","enum":["cm-1","eV","K","J/mol","kJ/mol","kcal/mol"]}},"required":["value","unit"],"additionalProperties":false};

function validate21(data, {instancePath="", parentData, parentDataProperty, rootData=data, dynamicAnchors={}}={}){
let vErrors = null;
let errors = 0;
const evaluated0 = validate21.evaluated;
if(evaluated0.dynamicProps){
evaluated0.props = undefined;
}
if(evaluated0.dynamicItems){
evaluated0.items = undefined;
}
if(data && typeof data == "object" && !Array.isArray(data)){
if(data.energy === undefined){
const err0 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "energy"},message:"must have required property '"+"energy"+"'",schema:schema35.required,parentSchema:schema35,data};
if(vErrors === null){
vErrors = [err0];
}
else {
vErrors.push(err0);
}
errors++;
}
if(data.degeneracy === undefined){
const err1 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "degeneracy"},message:"must have required property '"+"degeneracy"+"'",schema:schema35.required,parentSchema:schema35,data};
if(vErrors === null){
vErrors = [err1];
}
else {
vErrors.push(err1);
}
errors++;
}
for(const key0 in data){
if(!(((key0 === "energy") || (key0 === "degeneracy")) || (key0 === "term"))){
const err2 = {instancePath,schemaPath:"#/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key0},message:"must NOT have additional properties",schema:false,parentSchema:schema35,data};
if(vErrors === null){
vErrors = [err2];
}
else {
vErrors.push(err2);
}
errors++;
}
}
if(data.energy !== undefined){
let data0 = data.energy;
if((!((typeof data0 == "number") && (isFinite(data0)))) && (!(data0 && typeof data0 == "object" && !Array.isArray(data0)))){
const err3 = {instancePath:instancePath+"/energy",schemaPath:"#/$defs/nonNegativeEnergy/type",keyword:"type",params:{type: schema36.type},message:"must be number,object",schema:schema36.type,parentSchema:schema36,data:data0};
if(vErrors === null){
vErrors = [err3];
}
else {
vErrors.push(err3);
}
errors++;
}
if((typeof data0 == "number") && (isFinite(data0))){
if(data0 < 0 || isNaN(data0)){
const err4 = {instancePath:instancePath+"/energy",schemaPath:"#/$defs/nonNegativeEnergy/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema36,data:data0};
if(vErrors === null){
vErrors = [err4];
}
else {
vErrors.push(err4);
}
errors++;
}
}
if(data0 && typeof data0 == "object" && !Array.isArray(data0)){
if(data0.value === undefined){
const err5 = {instancePath:instancePath+"/energy",schemaPath:"#/$defs/nonNegativeEnergy/required",keyword:"required",params:{missingProperty: "value"},message:"must have required property '"+"value"+"'",schema:schema36.required,parentSchema:schema36,data:data0};
if(vErrors === null){
vErrors = [err5];
}
else {
vErrors.push(err5);
}
errors++;
}
if(data0.unit === undefined){
const err6 = {instancePath:instancePath+"/energy",schemaPath:"#/$defs/nonNegativeEnergy/required",keyword:"required",params:{missingProperty: "unit"},message:"must have required property '"+"unit"+"'",schema:schema36.required,parentSchema:schema36,data:data0};
if(vErrors === null){
vErrors = [err6];
}
else {
vErrors.push(err6);
}
errors++;
}
for(const key1 in data0){
if(!((key1 === "value") || (key1 === "unit"))){
const err7 = {instancePath:instancePath+"/energy",schemaPath:"#/$defs/nonNegativeEnergy/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key1},message:"must NOT have additional properties",schema:false,parentSchema:schema36,data:data0};
if(vErrors === null){
vErrors = [err7];
}
else {
vErrors.push(err7);
}
errors++;
}
}
if(data0.value !== undefined){
let data1 = data0.value;
if((typeof data1 == "number") && (isFinite(data1))){
if(data1 < 0 || isNaN(data1)){
const err8 = {instancePath:instancePath+"/energy/value",schemaPath:"#/$defs/nonNegativeEnergy/properties/value/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema36.properties.value,data:data1};
if(vErrors === null){
vErrors = [err8];
}
else {
vErrors.push(err8);
}
errors++;
}
}
else {
const err9 = {instancePath:instancePath+"/energy/value",schemaPath:"#/$defs/nonNegativeEnergy/properties/value/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema36.properties.value.type,parentSchema:schema36.properties.value,data:data1};
if(vErrors === null){
vErrors = [err9];
}
else {
vErrors.push(err9);
}
errors++;
}
}
if(data0.unit !== undefined){
let data2 = data0.unit;
if(!((((((data2 === "cm-1") || (data2 === "eV")) || (data2 === "K")) || (data2 === "J/mol")) || (data2 === "kJ/mol")) || (data2 === "kcal/mol"))){
const err10 = {instancePath:instancePath+"/energy/unit",schemaPath:"#/$defs/nonNegativeEnergy/properties/unit/enum",keyword:"enum",params:{allowedValues: schema36.properties.unit.enum},message:"must be equal to one of the allowed values",schema:schema36.properties.unit.enum,parentSchema:schema36.properties.unit,data:data2};
if(vErrors === null){
vErrors = [err10];
}
else {
vErrors.push(err10);
}
errors++;
}
}
}
}
if(data.degeneracy !== undefined){
let data3 = data.degeneracy;
if(!(((typeof data3 == "number") && (!(data3 % 1) && !isNaN(data3))) && (isFinite(data3)))){
const err11 = {instancePath:instancePath+"/degeneracy",schemaPath:"#/$defs/positiveInteger/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema32.type,parentSchema:schema32,data:data3};
if(vErrors === null){
vErrors = [err11];
}
else {
vErrors.push(err11);
}
errors++;
}
if((typeof data3 == "number") && (isFinite(data3))){
if(data3 < 1 || isNaN(data3)){
const err12 = {instancePath:instancePath+"/degeneracy",schemaPath:"#/$defs/positiveInteger/minimum",keyword:"minimum",params:{comparison: ">=", limit: 1},message:"must be >= 1",schema:1,parentSchema:schema32,data:data3};
if(vErrors === null){
vErrors = [err12];
}
else {
vErrors.push(err12);
}
errors++;
}
}
}
if(data.term !== undefined){
let data4 = data.term;
if(typeof data4 === "string"){
if(func2(data4) < 1){
const err13 = {instancePath:instancePath+"/term",schemaPath:"#/properties/term/minLength",keyword:"minLength",params:{limit: 1},message:"must NOT have fewer than 1 characters",schema:1,parentSchema:schema35.properties.term,data:data4};
if(vErrors === null){
vErrors = [err13];
}
else {
vErrors.push(err13);
}
errors++;
}
}
else {
const err14 = {instancePath:instancePath+"/term",schemaPath:"#/properties/term/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema35.properties.term.type,parentSchema:schema35.properties.term,data:data4};
if(vErrors === null){
vErrors = [err14];
}
else {
vErrors.push(err14);
}
errors++;
}
}
}
else {
const err15 = {instancePath,schemaPath:"#/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema35.type,parentSchema:schema35,data};
if(vErrors === null){
vErrors = [err15];
}
else {
vErrors.push(err15);
}
errors++;
}
validate21.errors = vErrors;
return errors === 0;
}
validate21.evaluated = {"props":true,"dynamicProps":false,"dynamicItems":false};

const schema42 = {"title":"a wavenumber > 0 in cm-1, {value, unit}, or {wavenumber, degeneracy} (e.g. 1333, {value: 1333, unit: cm-1}, {wavenumber: {value: 667, unit: cm-1}, degeneracy: 2})","description":"One harmonic vibration: a fundamental wavenumber (a bare number in cm-1, or {value, unit}; degeneracy 1), or {wavenumber, degeneracy} with the wavenumber itself a bare number in cm-1 or {value, unit}.","oneOf":[{"$ref":"#/$defs/wavenumber"},{"title":"{wavenumber, degeneracy}","description":"A vibration with its degeneracy.","type":"object","additionalProperties":false,"required":["wavenumber"],"properties":{"wavenumber":{"$ref":"#/$defs/wavenumber","description":"Fundamental wavenumber (cm-1 when a bare number)."},"degeneracy":{"$ref":"#/$defs/positiveInteger","description":"Number of modes sharing this wavenumber. Default 1.","default":1}}}]};
const schema43 = {"title":"a wavenumber > 0 in cm-1, or {value, unit} with value > 0","description":"A vibrational wavenumber, strictly positive. A bare number is in cm-1; or {value, unit} with unit one of cm-1, eV, K, J/mol, kJ/mol, kcal/mol (per particle for cm-1, eV, K; per mole for the molar units).","type":["number","object"],"exclusiveMinimum":0,"properties":{"value":{"type":"number","description":"Numeric value in `unit`.","exclusiveMinimum":0},"unit":{"description":"Unit of `value`.","enum":["cm-1","eV","K","J/mol","kJ/mol","kcal/mol"]}},"required":["value","unit"],"additionalProperties":false};

function validate23(data, {instancePath="", parentData, parentDataProperty, rootData=data, dynamicAnchors={}}={}){
let vErrors = null;
let errors = 0;
const evaluated0 = validate23.evaluated;
if(evaluated0.dynamicProps){
evaluated0.props = undefined;
}
if(evaluated0.dynamicItems){
evaluated0.items = undefined;
}
const _errs0 = errors;
let valid0 = false;
let passing0 = null;
const _errs1 = errors;
if((!((typeof data == "number") && (isFinite(data)))) && (!(data && typeof data == "object" && !Array.isArray(data)))){
const err0 = {instancePath,schemaPath:"#/$defs/wavenumber/type",keyword:"type",params:{type: schema43.type},message:"must be number,object",schema:schema43.type,parentSchema:schema43,data};
if(vErrors === null){
vErrors = [err0];
}
else {
vErrors.push(err0);
}
errors++;
}
if((typeof data == "number") && (isFinite(data))){
if(data <= 0 || isNaN(data)){
const err1 = {instancePath,schemaPath:"#/$defs/wavenumber/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema43,data};
if(vErrors === null){
vErrors = [err1];
}
else {
vErrors.push(err1);
}
errors++;
}
}
if(data && typeof data == "object" && !Array.isArray(data)){
if(data.value === undefined){
const err2 = {instancePath,schemaPath:"#/$defs/wavenumber/required",keyword:"required",params:{missingProperty: "value"},message:"must have required property '"+"value"+"'",schema:schema43.required,parentSchema:schema43,data};
if(vErrors === null){
vErrors = [err2];
}
else {
vErrors.push(err2);
}
errors++;
}
if(data.unit === undefined){
const err3 = {instancePath,schemaPath:"#/$defs/wavenumber/required",keyword:"required",params:{missingProperty: "unit"},message:"must have required property '"+"unit"+"'",schema:schema43.required,parentSchema:schema43,data};
if(vErrors === null){
vErrors = [err3];
}
else {
vErrors.push(err3);
}
errors++;
}
for(const key0 in data){
if(!((key0 === "value") || (key0 === "unit"))){
const err4 = {instancePath,schemaPath:"#/$defs/wavenumber/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key0},message:"must NOT have additional properties",schema:false,parentSchema:schema43,data};
if(vErrors === null){
vErrors = [err4];
}
else {
vErrors.push(err4);
}
errors++;
}
}
if(data.value !== undefined){
let data0 = data.value;
if((typeof data0 == "number") && (isFinite(data0))){
if(data0 <= 0 || isNaN(data0)){
const err5 = {instancePath:instancePath+"/value",schemaPath:"#/$defs/wavenumber/properties/value/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema43.properties.value,data:data0};
if(vErrors === null){
vErrors = [err5];
}
else {
vErrors.push(err5);
}
errors++;
}
}
else {
const err6 = {instancePath:instancePath+"/value",schemaPath:"#/$defs/wavenumber/properties/value/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema43.properties.value.type,parentSchema:schema43.properties.value,data:data0};
if(vErrors === null){
vErrors = [err6];
}
else {
vErrors.push(err6);
}
errors++;
}
}
if(data.unit !== undefined){
let data1 = data.unit;
if(!((((((data1 === "cm-1") || (data1 === "eV")) || (data1 === "K")) || (data1 === "J/mol")) || (data1 === "kJ/mol")) || (data1 === "kcal/mol"))){
const err7 = {instancePath:instancePath+"/unit",schemaPath:"#/$defs/wavenumber/properties/unit/enum",keyword:"enum",params:{allowedValues: schema43.properties.unit.enum},message:"must be equal to one of the allowed values",schema:schema43.properties.unit.enum,parentSchema:schema43.properties.unit,data:data1};
if(vErrors === null){
vErrors = [err7];
}
else {
vErrors.push(err7);
}
errors++;
}
}
}
var _valid0 = _errs1 === errors;
if(_valid0){
valid0 = true;
passing0 = 0;
var props0 = true;
}
const _errs8 = errors;
if(data && typeof data == "object" && !Array.isArray(data)){
if(data.wavenumber === undefined){
const err8 = {instancePath,schemaPath:"#/oneOf/1/required",keyword:"required",params:{missingProperty: "wavenumber"},message:"must have required property '"+"wavenumber"+"'",schema:schema42.oneOf[1].required,parentSchema:schema42.oneOf[1],data};
if(vErrors === null){
vErrors = [err8];
}
else {
vErrors.push(err8);
}
errors++;
}
for(const key1 in data){
if(!((key1 === "wavenumber") || (key1 === "degeneracy"))){
const err9 = {instancePath,schemaPath:"#/oneOf/1/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key1},message:"must NOT have additional properties",schema:false,parentSchema:schema42.oneOf[1],data};
if(vErrors === null){
vErrors = [err9];
}
else {
vErrors.push(err9);
}
errors++;
}
}
if(data.wavenumber !== undefined){
let data2 = data.wavenumber;
if((!((typeof data2 == "number") && (isFinite(data2)))) && (!(data2 && typeof data2 == "object" && !Array.isArray(data2)))){
const err10 = {instancePath:instancePath+"/wavenumber",schemaPath:"#/$defs/wavenumber/type",keyword:"type",params:{type: schema43.type},message:"must be number,object",schema:schema43.type,parentSchema:schema43,data:data2};
if(vErrors === null){
vErrors = [err10];
}
else {
vErrors.push(err10);
}
errors++;
}
if((typeof data2 == "number") && (isFinite(data2))){
if(data2 <= 0 || isNaN(data2)){
const err11 = {instancePath:instancePath+"/wavenumber",schemaPath:"#/$defs/wavenumber/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema43,data:data2};
if(vErrors === null){
vErrors = [err11];
}
else {
vErrors.push(err11);
}
errors++;
}
}
if(data2 && typeof data2 == "object" && !Array.isArray(data2)){
if(data2.value === undefined){
const err12 = {instancePath:instancePath+"/wavenumber",schemaPath:"#/$defs/wavenumber/required",keyword:"required",params:{missingProperty: "value"},message:"must have required property '"+"value"+"'",schema:schema43.required,parentSchema:schema43,data:data2};
if(vErrors === null){
vErrors = [err12];
}
else {
vErrors.push(err12);
}
errors++;
}
if(data2.unit === undefined){
const err13 = {instancePath:instancePath+"/wavenumber",schemaPath:"#/$defs/wavenumber/required",keyword:"required",params:{missingProperty: "unit"},message:"must have required property '"+"unit"+"'",schema:schema43.required,parentSchema:schema43,data:data2};
if(vErrors === null){
vErrors = [err13];
}
else {
vErrors.push(err13);
}
errors++;
}
for(const key2 in data2){
if(!((key2 === "value") || (key2 === "unit"))){
const err14 = {instancePath:instancePath+"/wavenumber",schemaPath:"#/$defs/wavenumber/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key2},message:"must NOT have additional properties",schema:false,parentSchema:schema43,data:data2};
if(vErrors === null){
vErrors = [err14];
}
else {
vErrors.push(err14);
}
errors++;
}
}
if(data2.value !== undefined){
let data3 = data2.value;
if((typeof data3 == "number") && (isFinite(data3))){
if(data3 <= 0 || isNaN(data3)){
const err15 = {instancePath:instancePath+"/wavenumber/value",schemaPath:"#/$defs/wavenumber/properties/value/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema43.properties.value,data:data3};
if(vErrors === null){
vErrors = [err15];
}
else {
vErrors.push(err15);
}
errors++;
}
}
else {
const err16 = {instancePath:instancePath+"/wavenumber/value",schemaPath:"#/$defs/wavenumber/properties/value/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema43.properties.value.type,parentSchema:schema43.properties.value,data:data3};
if(vErrors === null){
vErrors = [err16];
}
else {
vErrors.push(err16);
}
errors++;
}
}
if(data2.unit !== undefined){
let data4 = data2.unit;
if(!((((((data4 === "cm-1") || (data4 === "eV")) || (data4 === "K")) || (data4 === "J/mol")) || (data4 === "kJ/mol")) || (data4 === "kcal/mol"))){
const err17 = {instancePath:instancePath+"/wavenumber/unit",schemaPath:"#/$defs/wavenumber/properties/unit/enum",keyword:"enum",params:{allowedValues: schema43.properties.unit.enum},message:"must be equal to one of the allowed values",schema:schema43.properties.unit.enum,parentSchema:schema43.properties.unit,data:data4};
if(vErrors === null){
vErrors = [err17];
}
else {
vErrors.push(err17);
}
errors++;
}
}
}
}
if(data.degeneracy !== undefined){
let data5 = data.degeneracy;
if(!(((typeof data5 == "number") && (!(data5 % 1) && !isNaN(data5))) && (isFinite(data5)))){
const err18 = {instancePath:instancePath+"/degeneracy",schemaPath:"#/$defs/positiveInteger/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema32.type,parentSchema:schema32,data:data5};
if(vErrors === null){
vErrors = [err18];
}
else {
vErrors.push(err18);
}
errors++;
}
if((typeof data5 == "number") && (isFinite(data5))){
if(data5 < 1 || isNaN(data5)){
const err19 = {instancePath:instancePath+"/degeneracy",schemaPath:"#/$defs/positiveInteger/minimum",keyword:"minimum",params:{comparison: ">=", limit: 1},message:"must be >= 1",schema:1,parentSchema:schema32,data:data5};
if(vErrors === null){
vErrors = [err19];
}
else {
vErrors.push(err19);
}
errors++;
}
}
}
}
else {
const err20 = {instancePath,schemaPath:"#/oneOf/1/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema42.oneOf[1].type,parentSchema:schema42.oneOf[1],data};
if(vErrors === null){
vErrors = [err20];
}
else {
vErrors.push(err20);
}
errors++;
}
var _valid0 = _errs8 === errors;
if(_valid0 && valid0){
valid0 = false;
passing0 = [passing0, 1];
}
else {
if(_valid0){
valid0 = true;
passing0 = 1;
if(props0 !== true){
props0 = true;
}
}
}
if(!valid0){
const err21 = {instancePath,schemaPath:"#/oneOf",keyword:"oneOf",params:{passingSchemas: passing0},message:"must match exactly one schema in oneOf",schema:schema42.oneOf,parentSchema:schema42,data};
if(vErrors === null){
vErrors = [err21];
}
else {
vErrors.push(err21);
}
errors++;
}
else {
errors = _errs0;
if(vErrors !== null){
if(_errs0){
vErrors.length = _errs0;
}
else {
vErrors = null;
}
}
}
validate23.errors = vErrors;
evaluated0.props = props0;
return errors === 0;
}
validate23.evaluated = {"dynamicProps":true,"dynamicItems":false};

const schema46 = {"title":"a hindered internal rotor {axis | moment_of_inertia | rotational_constant, barrier | potential, symmetry_number?, top?, foldedness?}","description":"One torsion as a one-dimensional hindered rotor H = B(-d^2/dphi^2) + V(phi), B = h/(8 pi^2 c I_red), levels from a direct diagonalisation in the free-rotor basis. The reduced moment: from the geometry (axis, top) by Pitzer's I(2,3), or given as moment_of_inertia or rotational_constant (exactly one of the three). The potential: barrier (+ foldedness), or potential {barrier, foldedness} | {fourier, unit} | {scan, unit} (exactly one of barrier and potential).","type":"object","additionalProperties":false,"required":[],"properties":{"axis":{"title":"two 1-based atom indices [i, j] of a bond in the geometry","description":"The torsion bond, as 1-based indices into geometry (the two atoms must be bonded). Needs geometry or geometry_file; the reduced moment of inertia then follows from the geometry.","type":"array","minItems":2,"maxItems":2,"items":{"$ref":"#/$defs/positiveInteger"}},"top":{"title":"a non-empty list of 1-based atom indices","description":"With axis, optional: the atoms that turn (one whole side of the bond; the axis atom may be left out). Default: the side with fewer atoms.","type":"array","minItems":1,"items":{"$ref":"#/$defs/positiveInteger"}},"barrier":{"$ref":"#/$defs/nonNegativeEnergy","description":"Barrier height V0 of the potential (V0/2)(1 - cos n phi), >= 0 (cm-1 when a bare number; 0 gives a free rotor). Alternative to potential."},"symmetry_number":{"$ref":"#/$defs/positiveInteger","description":"Symmetry number sigma of the internal rotor (3 for a CH3 top, 1 for an OH top): the levels of the full turn are divided by it. Also the foldedness n when foldedness is not given. Required unless axis is given (then it follows from the geometry: lcm of the rotation symmetry of the two sides about the axis)."},"foldedness":{"$ref":"#/$defs/positiveInteger","description":"Foldedness n: number of potential minima per full turn. Default: symmetry_number. Differs from it for a torsion of distinguishable wells, e.g. n = 2 with symmetry_number 1 for the two mirror-image wells of H2O2."},"moment_of_inertia":{"$ref":"#/$defs/momentOfInertia","description":"Reduced moment of inertia I_red of the torsion (amu*angstrom^2 when a bare number; e.g. I1 I2/(I1 + I2) for two coaxial tops, or Pitzer's reduced moment). Alternative to rotational_constant."},"rotational_constant":{"$ref":"#/$defs/rotationalConstant","description":"Reduced rotational constant B = h/(8 pi^2 c I_red) of the torsion (cm-1 when a bare number). Alternative to moment_of_inertia."},"potential":{"$ref":"#/$defs/torsionPotential","description":"The torsional potential V(phi). Alternative to barrier."}}};
const schema54 = {"title":"{barrier, foldedness?} or {fourier: [[n, V_cos, V_sin], ...], unit?} or {scan: [[angle_deg, energy], ...], unit?}","description":"A torsional potential: {barrier, foldedness?} is (V0/2)(1 - cos n phi); {fourier} is V(phi) = sum V_cos (1 - cos n phi)/2 + V_sin sin(n phi)/2; {scan} is a relaxed scan [angle in degrees, energy] fitted to a Fourier series in multiples of the rotor symmetry number (the scan must cover the period 360/symmetry_number). unit (default cm-1) applies to V_cos, V_sin and scan energies.","type":"object","additionalProperties":false,"properties":{"barrier":{"$ref":"#/$defs/nonNegativeEnergy","description":"Barrier height V0 (cm-1 when a bare number)."},"foldedness":{"$ref":"#/$defs/positiveInteger","description":"Foldedness n of the barrier form. Default: the rotor symmetry number."},"fourier":{"type":"array","minItems":1,"title":"a non-empty list of [n, V_cos, V_sin]","description":"Fourier terms [n >= 1, V_cos, V_sin] in unit.","items":{"type":"array","minItems":3,"maxItems":3,"prefixItems":[{"$ref":"#/$defs/positiveInteger"},{"type":"number"},{"type":"number"}]}},"scan":{"type":"array","minItems":5,"title":"at least 5 points [angle_deg, energy]","description":"Scan points [torsion angle in degrees, energy in unit]; the energy zero is arbitrary.","items":{"type":"array","minItems":2,"maxItems":2,"prefixItems":[{"type":"number"},{"type":"number"}]}},"unit":{"enum":["cm-1","eV","K","J/mol","kJ/mol","kcal/mol"],"default":"cm-1","description":"Unit of V_cos, V_sin and scan energies. Default cm-1."}},"oneOf":[{"required":["barrier"],"title":"the barrier form"},{"required":["fourier"],"title":"the fourier form"},{"required":["scan"],"title":"the scan form"}]};

function validate26(data, {instancePath="", parentData, parentDataProperty, rootData=data, dynamicAnchors={}}={}){
let vErrors = null;
let errors = 0;
const evaluated0 = validate26.evaluated;
if(evaluated0.dynamicProps){
evaluated0.props = undefined;
}
if(evaluated0.dynamicItems){
evaluated0.items = undefined;
}
const _errs1 = errors;
let valid0 = false;
let passing0 = null;
const _errs2 = errors;
if(data && typeof data == "object" && !Array.isArray(data)){
if(data.barrier === undefined){
const err0 = {instancePath,schemaPath:"#/oneOf/0/required",keyword:"required",params:{missingProperty: "barrier"},message:"must have required property '"+"barrier"+"'",schema:schema54.oneOf[0].required,parentSchema:schema54.oneOf[0],data};
if(vErrors === null){
vErrors = [err0];
}
else {
vErrors.push(err0);
}
errors++;
}
}
var _valid0 = _errs2 === errors;
if(_valid0){
valid0 = true;
passing0 = 0;
}
const _errs3 = errors;
if(data && typeof data == "object" && !Array.isArray(data)){
if(data.fourier === undefined){
const err1 = {instancePath,schemaPath:"#/oneOf/1/required",keyword:"required",params:{missingProperty: "fourier"},message:"must have required property '"+"fourier"+"'",schema:schema54.oneOf[1].required,parentSchema:schema54.oneOf[1],data};
if(vErrors === null){
vErrors = [err1];
}
else {
vErrors.push(err1);
}
errors++;
}
}
var _valid0 = _errs3 === errors;
if(_valid0 && valid0){
valid0 = false;
passing0 = [passing0, 1];
}
else {
if(_valid0){
valid0 = true;
passing0 = 1;
}
const _errs4 = errors;
if(data && typeof data == "object" && !Array.isArray(data)){
if(data.scan === undefined){
const err2 = {instancePath,schemaPath:"#/oneOf/2/required",keyword:"required",params:{missingProperty: "scan"},message:"must have required property '"+"scan"+"'",schema:schema54.oneOf[2].required,parentSchema:schema54.oneOf[2],data};
if(vErrors === null){
vErrors = [err2];
}
else {
vErrors.push(err2);
}
errors++;
}
}
var _valid0 = _errs4 === errors;
if(_valid0 && valid0){
valid0 = false;
passing0 = [passing0, 2];
}
else {
if(_valid0){
valid0 = true;
passing0 = 2;
}
}
}
if(!valid0){
const err3 = {instancePath,schemaPath:"#/oneOf",keyword:"oneOf",params:{passingSchemas: passing0},message:"must match exactly one schema in oneOf",schema:schema54.oneOf,parentSchema:schema54,data};
if(vErrors === null){
vErrors = [err3];
}
else {
vErrors.push(err3);
}
errors++;
}
else {
errors = _errs1;
if(vErrors !== null){
if(_errs1){
vErrors.length = _errs1;
}
else {
vErrors = null;
}
}
}
if(data && typeof data == "object" && !Array.isArray(data)){
for(const key0 in data){
if(!(((((key0 === "barrier") || (key0 === "foldedness")) || (key0 === "fourier")) || (key0 === "scan")) || (key0 === "unit"))){
const err4 = {instancePath,schemaPath:"#/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key0},message:"must NOT have additional properties",schema:false,parentSchema:schema54,data};
if(vErrors === null){
vErrors = [err4];
}
else {
vErrors.push(err4);
}
errors++;
}
}
if(data.barrier !== undefined){
let data0 = data.barrier;
if((!((typeof data0 == "number") && (isFinite(data0)))) && (!(data0 && typeof data0 == "object" && !Array.isArray(data0)))){
const err5 = {instancePath:instancePath+"/barrier",schemaPath:"#/$defs/nonNegativeEnergy/type",keyword:"type",params:{type: schema36.type},message:"must be number,object",schema:schema36.type,parentSchema:schema36,data:data0};
if(vErrors === null){
vErrors = [err5];
}
else {
vErrors.push(err5);
}
errors++;
}
if((typeof data0 == "number") && (isFinite(data0))){
if(data0 < 0 || isNaN(data0)){
const err6 = {instancePath:instancePath+"/barrier",schemaPath:"#/$defs/nonNegativeEnergy/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema36,data:data0};
if(vErrors === null){
vErrors = [err6];
}
else {
vErrors.push(err6);
}
errors++;
}
}
if(data0 && typeof data0 == "object" && !Array.isArray(data0)){
if(data0.value === undefined){
const err7 = {instancePath:instancePath+"/barrier",schemaPath:"#/$defs/nonNegativeEnergy/required",keyword:"required",params:{missingProperty: "value"},message:"must have required property '"+"value"+"'",schema:schema36.required,parentSchema:schema36,data:data0};
if(vErrors === null){
vErrors = [err7];
}
else {
vErrors.push(err7);
}
errors++;
}
if(data0.unit === undefined){
const err8 = {instancePath:instancePath+"/barrier",schemaPath:"#/$defs/nonNegativeEnergy/required",keyword:"required",params:{missingProperty: "unit"},message:"must have required property '"+"unit"+"'",schema:schema36.required,parentSchema:schema36,data:data0};
if(vErrors === null){
vErrors = [err8];
}
else {
vErrors.push(err8);
}
errors++;
}
for(const key1 in data0){
if(!((key1 === "value") || (key1 === "unit"))){
const err9 = {instancePath:instancePath+"/barrier",schemaPath:"#/$defs/nonNegativeEnergy/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key1},message:"must NOT have additional properties",schema:false,parentSchema:schema36,data:data0};
if(vErrors === null){
vErrors = [err9];
}
else {
vErrors.push(err9);
}
errors++;
}
}
if(data0.value !== undefined){
let data1 = data0.value;
if((typeof data1 == "number") && (isFinite(data1))){
if(data1 < 0 || isNaN(data1)){
const err10 = {instancePath:instancePath+"/barrier/value",schemaPath:"#/$defs/nonNegativeEnergy/properties/value/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema36.properties.value,data:data1};
if(vErrors === null){
vErrors = [err10];
}
else {
vErrors.push(err10);
}
errors++;
}
}
else {
const err11 = {instancePath:instancePath+"/barrier/value",schemaPath:"#/$defs/nonNegativeEnergy/properties/value/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema36.properties.value.type,parentSchema:schema36.properties.value,data:data1};
if(vErrors === null){
vErrors = [err11];
}
else {
vErrors.push(err11);
}
errors++;
}
}
if(data0.unit !== undefined){
let data2 = data0.unit;
if(!((((((data2 === "cm-1") || (data2 === "eV")) || (data2 === "K")) || (data2 === "J/mol")) || (data2 === "kJ/mol")) || (data2 === "kcal/mol"))){
const err12 = {instancePath:instancePath+"/barrier/unit",schemaPath:"#/$defs/nonNegativeEnergy/properties/unit/enum",keyword:"enum",params:{allowedValues: schema36.properties.unit.enum},message:"must be equal to one of the allowed values",schema:schema36.properties.unit.enum,parentSchema:schema36.properties.unit,data:data2};
if(vErrors === null){
vErrors = [err12];
}
else {
vErrors.push(err12);
}
errors++;
}
}
}
}
if(data.foldedness !== undefined){
let data3 = data.foldedness;
if(!(((typeof data3 == "number") && (!(data3 % 1) && !isNaN(data3))) && (isFinite(data3)))){
const err13 = {instancePath:instancePath+"/foldedness",schemaPath:"#/$defs/positiveInteger/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema32.type,parentSchema:schema32,data:data3};
if(vErrors === null){
vErrors = [err13];
}
else {
vErrors.push(err13);
}
errors++;
}
if((typeof data3 == "number") && (isFinite(data3))){
if(data3 < 1 || isNaN(data3)){
const err14 = {instancePath:instancePath+"/foldedness",schemaPath:"#/$defs/positiveInteger/minimum",keyword:"minimum",params:{comparison: ">=", limit: 1},message:"must be >= 1",schema:1,parentSchema:schema32,data:data3};
if(vErrors === null){
vErrors = [err14];
}
else {
vErrors.push(err14);
}
errors++;
}
}
}
if(data.fourier !== undefined){
let data4 = data.fourier;
if(Array.isArray(data4)){
if(data4.length < 1){
const err15 = {instancePath:instancePath+"/fourier",schemaPath:"#/properties/fourier/minItems",keyword:"minItems",params:{limit: 1},message:"must NOT have fewer than 1 items",schema:1,parentSchema:schema54.properties.fourier,data:data4};
if(vErrors === null){
vErrors = [err15];
}
else {
vErrors.push(err15);
}
errors++;
}
const len0 = data4.length;
for(let i0=0; i0<len0; i0++){
let data5 = data4[i0];
if(Array.isArray(data5)){
if(data5.length > 3){
const err16 = {instancePath:instancePath+"/fourier/" + i0,schemaPath:"#/properties/fourier/items/maxItems",keyword:"maxItems",params:{limit: 3},message:"must NOT have more than 3 items",schema:3,parentSchema:schema54.properties.fourier.items,data:data5};
if(vErrors === null){
vErrors = [err16];
}
else {
vErrors.push(err16);
}
errors++;
}
if(data5.length < 3){
const err17 = {instancePath:instancePath+"/fourier/" + i0,schemaPath:"#/properties/fourier/items/minItems",keyword:"minItems",params:{limit: 3},message:"must NOT have fewer than 3 items",schema:3,parentSchema:schema54.properties.fourier.items,data:data5};
if(vErrors === null){
vErrors = [err17];
}
else {
vErrors.push(err17);
}
errors++;
}
const len1 = data5.length;
if(len1 > 0){
let data6 = data5[0];
if(!(((typeof data6 == "number") && (!(data6 % 1) && !isNaN(data6))) && (isFinite(data6)))){
const err18 = {instancePath:instancePath+"/fourier/" + i0+"/0",schemaPath:"#/$defs/positiveInteger/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema32.type,parentSchema:schema32,data:data6};
if(vErrors === null){
vErrors = [err18];
}
else {
vErrors.push(err18);
}
errors++;
}
if((typeof data6 == "number") && (isFinite(data6))){
if(data6 < 1 || isNaN(data6)){
const err19 = {instancePath:instancePath+"/fourier/" + i0+"/0",schemaPath:"#/$defs/positiveInteger/minimum",keyword:"minimum",params:{comparison: ">=", limit: 1},message:"must be >= 1",schema:1,parentSchema:schema32,data:data6};
if(vErrors === null){
vErrors = [err19];
}
else {
vErrors.push(err19);
}
errors++;
}
}
}
if(len1 > 1){
let data7 = data5[1];
if(!((typeof data7 == "number") && (isFinite(data7)))){
const err20 = {instancePath:instancePath+"/fourier/" + i0+"/1",schemaPath:"#/properties/fourier/items/prefixItems/1/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema54.properties.fourier.items.prefixItems[1].type,parentSchema:schema54.properties.fourier.items.prefixItems[1],data:data7};
if(vErrors === null){
vErrors = [err20];
}
else {
vErrors.push(err20);
}
errors++;
}
}
if(len1 > 2){
let data8 = data5[2];
if(!((typeof data8 == "number") && (isFinite(data8)))){
const err21 = {instancePath:instancePath+"/fourier/" + i0+"/2",schemaPath:"#/properties/fourier/items/prefixItems/2/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema54.properties.fourier.items.prefixItems[2].type,parentSchema:schema54.properties.fourier.items.prefixItems[2],data:data8};
if(vErrors === null){
vErrors = [err21];
}
else {
vErrors.push(err21);
}
errors++;
}
}
}
else {
const err22 = {instancePath:instancePath+"/fourier/" + i0,schemaPath:"#/properties/fourier/items/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema54.properties.fourier.items.type,parentSchema:schema54.properties.fourier.items,data:data5};
if(vErrors === null){
vErrors = [err22];
}
else {
vErrors.push(err22);
}
errors++;
}
}
}
else {
const err23 = {instancePath:instancePath+"/fourier",schemaPath:"#/properties/fourier/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema54.properties.fourier.type,parentSchema:schema54.properties.fourier,data:data4};
if(vErrors === null){
vErrors = [err23];
}
else {
vErrors.push(err23);
}
errors++;
}
}
if(data.scan !== undefined){
let data9 = data.scan;
if(Array.isArray(data9)){
if(data9.length < 5){
const err24 = {instancePath:instancePath+"/scan",schemaPath:"#/properties/scan/minItems",keyword:"minItems",params:{limit: 5},message:"must NOT have fewer than 5 items",schema:5,parentSchema:schema54.properties.scan,data:data9};
if(vErrors === null){
vErrors = [err24];
}
else {
vErrors.push(err24);
}
errors++;
}
const len2 = data9.length;
for(let i1=0; i1<len2; i1++){
let data10 = data9[i1];
if(Array.isArray(data10)){
if(data10.length > 2){
const err25 = {instancePath:instancePath+"/scan/" + i1,schemaPath:"#/properties/scan/items/maxItems",keyword:"maxItems",params:{limit: 2},message:"must NOT have more than 2 items",schema:2,parentSchema:schema54.properties.scan.items,data:data10};
if(vErrors === null){
vErrors = [err25];
}
else {
vErrors.push(err25);
}
errors++;
}
if(data10.length < 2){
const err26 = {instancePath:instancePath+"/scan/" + i1,schemaPath:"#/properties/scan/items/minItems",keyword:"minItems",params:{limit: 2},message:"must NOT have fewer than 2 items",schema:2,parentSchema:schema54.properties.scan.items,data:data10};
if(vErrors === null){
vErrors = [err26];
}
else {
vErrors.push(err26);
}
errors++;
}
const len3 = data10.length;
if(len3 > 0){
let data11 = data10[0];
if(!((typeof data11 == "number") && (isFinite(data11)))){
const err27 = {instancePath:instancePath+"/scan/" + i1+"/0",schemaPath:"#/properties/scan/items/prefixItems/0/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema54.properties.scan.items.prefixItems[0].type,parentSchema:schema54.properties.scan.items.prefixItems[0],data:data11};
if(vErrors === null){
vErrors = [err27];
}
else {
vErrors.push(err27);
}
errors++;
}
}
if(len3 > 1){
let data12 = data10[1];
if(!((typeof data12 == "number") && (isFinite(data12)))){
const err28 = {instancePath:instancePath+"/scan/" + i1+"/1",schemaPath:"#/properties/scan/items/prefixItems/1/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema54.properties.scan.items.prefixItems[1].type,parentSchema:schema54.properties.scan.items.prefixItems[1],data:data12};
if(vErrors === null){
vErrors = [err28];
}
else {
vErrors.push(err28);
}
errors++;
}
}
}
else {
const err29 = {instancePath:instancePath+"/scan/" + i1,schemaPath:"#/properties/scan/items/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema54.properties.scan.items.type,parentSchema:schema54.properties.scan.items,data:data10};
if(vErrors === null){
vErrors = [err29];
}
else {
vErrors.push(err29);
}
errors++;
}
}
}
else {
const err30 = {instancePath:instancePath+"/scan",schemaPath:"#/properties/scan/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema54.properties.scan.type,parentSchema:schema54.properties.scan,data:data9};
if(vErrors === null){
vErrors = [err30];
}
else {
vErrors.push(err30);
}
errors++;
}
}
if(data.unit !== undefined){
let data13 = data.unit;
if(!((((((data13 === "cm-1") || (data13 === "eV")) || (data13 === "K")) || (data13 === "J/mol")) || (data13 === "kJ/mol")) || (data13 === "kcal/mol"))){
const err31 = {instancePath:instancePath+"/unit",schemaPath:"#/properties/unit/enum",keyword:"enum",params:{allowedValues: schema54.properties.unit.enum},message:"must be equal to one of the allowed values",schema:schema54.properties.unit.enum,parentSchema:schema54.properties.unit,data:data13};
if(vErrors === null){
vErrors = [err31];
}
else {
vErrors.push(err31);
}
errors++;
}
}
}
else {
const err32 = {instancePath,schemaPath:"#/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema54.type,parentSchema:schema54,data};
if(vErrors === null){
vErrors = [err32];
}
else {
vErrors.push(err32);
}
errors++;
}
validate26.errors = vErrors;
return errors === 0;
}
validate26.evaluated = {"props":true,"dynamicProps":false,"dynamicItems":false};


function validate25(data, {instancePath="", parentData, parentDataProperty, rootData=data, dynamicAnchors={}}={}){
let vErrors = null;
let errors = 0;
const evaluated0 = validate25.evaluated;
if(evaluated0.dynamicProps){
evaluated0.props = undefined;
}
if(evaluated0.dynamicItems){
evaluated0.items = undefined;
}
if(data && typeof data == "object" && !Array.isArray(data)){
for(const key0 in data){
if(!((((((((key0 === "axis") || (key0 === "top")) || (key0 === "barrier")) || (key0 === "symmetry_number")) || (key0 === "foldedness")) || (key0 === "moment_of_inertia")) || (key0 === "rotational_constant")) || (key0 === "potential"))){
const err0 = {instancePath,schemaPath:"#/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key0},message:"must NOT have additional properties",schema:false,parentSchema:schema46,data};
if(vErrors === null){
vErrors = [err0];
}
else {
vErrors.push(err0);
}
errors++;
}
}
if(data.axis !== undefined){
let data0 = data.axis;
if(Array.isArray(data0)){
if(data0.length > 2){
const err1 = {instancePath:instancePath+"/axis",schemaPath:"#/properties/axis/maxItems",keyword:"maxItems",params:{limit: 2},message:"must NOT have more than 2 items",schema:2,parentSchema:schema46.properties.axis,data:data0};
if(vErrors === null){
vErrors = [err1];
}
else {
vErrors.push(err1);
}
errors++;
}
if(data0.length < 2){
const err2 = {instancePath:instancePath+"/axis",schemaPath:"#/properties/axis/minItems",keyword:"minItems",params:{limit: 2},message:"must NOT have fewer than 2 items",schema:2,parentSchema:schema46.properties.axis,data:data0};
if(vErrors === null){
vErrors = [err2];
}
else {
vErrors.push(err2);
}
errors++;
}
const len0 = data0.length;
for(let i0=0; i0<len0; i0++){
let data1 = data0[i0];
if(!(((typeof data1 == "number") && (!(data1 % 1) && !isNaN(data1))) && (isFinite(data1)))){
const err3 = {instancePath:instancePath+"/axis/" + i0,schemaPath:"#/$defs/positiveInteger/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema32.type,parentSchema:schema32,data:data1};
if(vErrors === null){
vErrors = [err3];
}
else {
vErrors.push(err3);
}
errors++;
}
if((typeof data1 == "number") && (isFinite(data1))){
if(data1 < 1 || isNaN(data1)){
const err4 = {instancePath:instancePath+"/axis/" + i0,schemaPath:"#/$defs/positiveInteger/minimum",keyword:"minimum",params:{comparison: ">=", limit: 1},message:"must be >= 1",schema:1,parentSchema:schema32,data:data1};
if(vErrors === null){
vErrors = [err4];
}
else {
vErrors.push(err4);
}
errors++;
}
}
}
}
else {
const err5 = {instancePath:instancePath+"/axis",schemaPath:"#/properties/axis/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema46.properties.axis.type,parentSchema:schema46.properties.axis,data:data0};
if(vErrors === null){
vErrors = [err5];
}
else {
vErrors.push(err5);
}
errors++;
}
}
if(data.top !== undefined){
let data2 = data.top;
if(Array.isArray(data2)){
if(data2.length < 1){
const err6 = {instancePath:instancePath+"/top",schemaPath:"#/properties/top/minItems",keyword:"minItems",params:{limit: 1},message:"must NOT have fewer than 1 items",schema:1,parentSchema:schema46.properties.top,data:data2};
if(vErrors === null){
vErrors = [err6];
}
else {
vErrors.push(err6);
}
errors++;
}
const len1 = data2.length;
for(let i1=0; i1<len1; i1++){
let data3 = data2[i1];
if(!(((typeof data3 == "number") && (!(data3 % 1) && !isNaN(data3))) && (isFinite(data3)))){
const err7 = {instancePath:instancePath+"/top/" + i1,schemaPath:"#/$defs/positiveInteger/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema32.type,parentSchema:schema32,data:data3};
if(vErrors === null){
vErrors = [err7];
}
else {
vErrors.push(err7);
}
errors++;
}
if((typeof data3 == "number") && (isFinite(data3))){
if(data3 < 1 || isNaN(data3)){
const err8 = {instancePath:instancePath+"/top/" + i1,schemaPath:"#/$defs/positiveInteger/minimum",keyword:"minimum",params:{comparison: ">=", limit: 1},message:"must be >= 1",schema:1,parentSchema:schema32,data:data3};
if(vErrors === null){
vErrors = [err8];
}
else {
vErrors.push(err8);
}
errors++;
}
}
}
}
else {
const err9 = {instancePath:instancePath+"/top",schemaPath:"#/properties/top/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema46.properties.top.type,parentSchema:schema46.properties.top,data:data2};
if(vErrors === null){
vErrors = [err9];
}
else {
vErrors.push(err9);
}
errors++;
}
}
if(data.barrier !== undefined){
let data4 = data.barrier;
if((!((typeof data4 == "number") && (isFinite(data4)))) && (!(data4 && typeof data4 == "object" && !Array.isArray(data4)))){
const err10 = {instancePath:instancePath+"/barrier",schemaPath:"#/$defs/nonNegativeEnergy/type",keyword:"type",params:{type: schema36.type},message:"must be number,object",schema:schema36.type,parentSchema:schema36,data:data4};
if(vErrors === null){
vErrors = [err10];
}
else {
vErrors.push(err10);
}
errors++;
}
if((typeof data4 == "number") && (isFinite(data4))){
if(data4 < 0 || isNaN(data4)){
const err11 = {instancePath:instancePath+"/barrier",schemaPath:"#/$defs/nonNegativeEnergy/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema36,data:data4};
if(vErrors === null){
vErrors = [err11];
}
else {
vErrors.push(err11);
}
errors++;
}
}
if(data4 && typeof data4 == "object" && !Array.isArray(data4)){
if(data4.value === undefined){
const err12 = {instancePath:instancePath+"/barrier",schemaPath:"#/$defs/nonNegativeEnergy/required",keyword:"required",params:{missingProperty: "value"},message:"must have required property '"+"value"+"'",schema:schema36.required,parentSchema:schema36,data:data4};
if(vErrors === null){
vErrors = [err12];
}
else {
vErrors.push(err12);
}
errors++;
}
if(data4.unit === undefined){
const err13 = {instancePath:instancePath+"/barrier",schemaPath:"#/$defs/nonNegativeEnergy/required",keyword:"required",params:{missingProperty: "unit"},message:"must have required property '"+"unit"+"'",schema:schema36.required,parentSchema:schema36,data:data4};
if(vErrors === null){
vErrors = [err13];
}
else {
vErrors.push(err13);
}
errors++;
}
for(const key1 in data4){
if(!((key1 === "value") || (key1 === "unit"))){
const err14 = {instancePath:instancePath+"/barrier",schemaPath:"#/$defs/nonNegativeEnergy/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key1},message:"must NOT have additional properties",schema:false,parentSchema:schema36,data:data4};
if(vErrors === null){
vErrors = [err14];
}
else {
vErrors.push(err14);
}
errors++;
}
}
if(data4.value !== undefined){
let data5 = data4.value;
if((typeof data5 == "number") && (isFinite(data5))){
if(data5 < 0 || isNaN(data5)){
const err15 = {instancePath:instancePath+"/barrier/value",schemaPath:"#/$defs/nonNegativeEnergy/properties/value/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema36.properties.value,data:data5};
if(vErrors === null){
vErrors = [err15];
}
else {
vErrors.push(err15);
}
errors++;
}
}
else {
const err16 = {instancePath:instancePath+"/barrier/value",schemaPath:"#/$defs/nonNegativeEnergy/properties/value/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema36.properties.value.type,parentSchema:schema36.properties.value,data:data5};
if(vErrors === null){
vErrors = [err16];
}
else {
vErrors.push(err16);
}
errors++;
}
}
if(data4.unit !== undefined){
let data6 = data4.unit;
if(!((((((data6 === "cm-1") || (data6 === "eV")) || (data6 === "K")) || (data6 === "J/mol")) || (data6 === "kJ/mol")) || (data6 === "kcal/mol"))){
const err17 = {instancePath:instancePath+"/barrier/unit",schemaPath:"#/$defs/nonNegativeEnergy/properties/unit/enum",keyword:"enum",params:{allowedValues: schema36.properties.unit.enum},message:"must be equal to one of the allowed values",schema:schema36.properties.unit.enum,parentSchema:schema36.properties.unit,data:data6};
if(vErrors === null){
vErrors = [err17];
}
else {
vErrors.push(err17);
}
errors++;
}
}
}
}
if(data.symmetry_number !== undefined){
let data7 = data.symmetry_number;
if(!(((typeof data7 == "number") && (!(data7 % 1) && !isNaN(data7))) && (isFinite(data7)))){
const err18 = {instancePath:instancePath+"/symmetry_number",schemaPath:"#/$defs/positiveInteger/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema32.type,parentSchema:schema32,data:data7};
if(vErrors === null){
vErrors = [err18];
}
else {
vErrors.push(err18);
}
errors++;
}
if((typeof data7 == "number") && (isFinite(data7))){
if(data7 < 1 || isNaN(data7)){
const err19 = {instancePath:instancePath+"/symmetry_number",schemaPath:"#/$defs/positiveInteger/minimum",keyword:"minimum",params:{comparison: ">=", limit: 1},message:"must be >= 1",schema:1,parentSchema:schema32,data:data7};
if(vErrors === null){
vErrors = [err19];
}
else {
vErrors.push(err19);
}
errors++;
}
}
}
if(data.foldedness !== undefined){
let data8 = data.foldedness;
if(!(((typeof data8 == "number") && (!(data8 % 1) && !isNaN(data8))) && (isFinite(data8)))){
const err20 = {instancePath:instancePath+"/foldedness",schemaPath:"#/$defs/positiveInteger/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema32.type,parentSchema:schema32,data:data8};
if(vErrors === null){
vErrors = [err20];
}
else {
vErrors.push(err20);
}
errors++;
}
if((typeof data8 == "number") && (isFinite(data8))){
if(data8 < 1 || isNaN(data8)){
const err21 = {instancePath:instancePath+"/foldedness",schemaPath:"#/$defs/positiveInteger/minimum",keyword:"minimum",params:{comparison: ">=", limit: 1},message:"must be >= 1",schema:1,parentSchema:schema32,data:data8};
if(vErrors === null){
vErrors = [err21];
}
else {
vErrors.push(err21);
}
errors++;
}
}
}
if(data.moment_of_inertia !== undefined){
let data9 = data.moment_of_inertia;
if((!((typeof data9 == "number") && (isFinite(data9)))) && (!(data9 && typeof data9 == "object" && !Array.isArray(data9)))){
const err22 = {instancePath:instancePath+"/moment_of_inertia",schemaPath:"#/$defs/momentOfInertia/type",keyword:"type",params:{type: schema39.type},message:"must be number,object",schema:schema39.type,parentSchema:schema39,data:data9};
if(vErrors === null){
vErrors = [err22];
}
else {
vErrors.push(err22);
}
errors++;
}
if((typeof data9 == "number") && (isFinite(data9))){
if(data9 <= 0 || isNaN(data9)){
const err23 = {instancePath:instancePath+"/moment_of_inertia",schemaPath:"#/$defs/momentOfInertia/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema39,data:data9};
if(vErrors === null){
vErrors = [err23];
}
else {
vErrors.push(err23);
}
errors++;
}
}
if(data9 && typeof data9 == "object" && !Array.isArray(data9)){
if(data9.value === undefined){
const err24 = {instancePath:instancePath+"/moment_of_inertia",schemaPath:"#/$defs/momentOfInertia/required",keyword:"required",params:{missingProperty: "value"},message:"must have required property '"+"value"+"'",schema:schema39.required,parentSchema:schema39,data:data9};
if(vErrors === null){
vErrors = [err24];
}
else {
vErrors.push(err24);
}
errors++;
}
if(data9.unit === undefined){
const err25 = {instancePath:instancePath+"/moment_of_inertia",schemaPath:"#/$defs/momentOfInertia/required",keyword:"required",params:{missingProperty: "unit"},message:"must have required property '"+"unit"+"'",schema:schema39.required,parentSchema:schema39,data:data9};
if(vErrors === null){
vErrors = [err25];
}
else {
vErrors.push(err25);
}
errors++;
}
for(const key2 in data9){
if(!((key2 === "value") || (key2 === "unit"))){
const err26 = {instancePath:instancePath+"/moment_of_inertia",schemaPath:"#/$defs/momentOfInertia/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key2},message:"must NOT have additional properties",schema:false,parentSchema:schema39,data:data9};
if(vErrors === null){
vErrors = [err26];
}
else {
vErrors.push(err26);
}
errors++;
}
}
if(data9.value !== undefined){
let data10 = data9.value;
if((typeof data10 == "number") && (isFinite(data10))){
if(data10 <= 0 || isNaN(data10)){
const err27 = {instancePath:instancePath+"/moment_of_inertia/value",schemaPath:"#/$defs/momentOfInertia/properties/value/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema39.properties.value,data:data10};
if(vErrors === null){
vErrors = [err27];
}
else {
vErrors.push(err27);
}
errors++;
}
}
else {
const err28 = {instancePath:instancePath+"/moment_of_inertia/value",schemaPath:"#/$defs/momentOfInertia/properties/value/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema39.properties.value.type,parentSchema:schema39.properties.value,data:data10};
if(vErrors === null){
vErrors = [err28];
}
else {
vErrors.push(err28);
}
errors++;
}
}
if(data9.unit !== undefined){
let data11 = data9.unit;
if(!(((data11 === "amu*angstrom^2") || (data11 === "kg*m^2")) || (data11 === "g*cm^2"))){
const err29 = {instancePath:instancePath+"/moment_of_inertia/unit",schemaPath:"#/$defs/momentOfInertia/properties/unit/enum",keyword:"enum",params:{allowedValues: schema39.properties.unit.enum},message:"must be equal to one of the allowed values",schema:schema39.properties.unit.enum,parentSchema:schema39.properties.unit,data:data11};
if(vErrors === null){
vErrors = [err29];
}
else {
vErrors.push(err29);
}
errors++;
}
}
}
}
if(data.rotational_constant !== undefined){
let data12 = data.rotational_constant;
if((!((typeof data12 == "number") && (isFinite(data12)))) && (!(data12 && typeof data12 == "object" && !Array.isArray(data12)))){
const err30 = {instancePath:instancePath+"/rotational_constant",schemaPath:"#/$defs/rotationalConstant/type",keyword:"type",params:{type: schema38.type},message:"must be number,object",schema:schema38.type,parentSchema:schema38,data:data12};
if(vErrors === null){
vErrors = [err30];
}
else {
vErrors.push(err30);
}
errors++;
}
if((typeof data12 == "number") && (isFinite(data12))){
if(data12 <= 0 || isNaN(data12)){
const err31 = {instancePath:instancePath+"/rotational_constant",schemaPath:"#/$defs/rotationalConstant/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema38,data:data12};
if(vErrors === null){
vErrors = [err31];
}
else {
vErrors.push(err31);
}
errors++;
}
}
if(data12 && typeof data12 == "object" && !Array.isArray(data12)){
if(data12.value === undefined){
const err32 = {instancePath:instancePath+"/rotational_constant",schemaPath:"#/$defs/rotationalConstant/required",keyword:"required",params:{missingProperty: "value"},message:"must have required property '"+"value"+"'",schema:schema38.required,parentSchema:schema38,data:data12};
if(vErrors === null){
vErrors = [err32];
}
else {
vErrors.push(err32);
}
errors++;
}
if(data12.unit === undefined){
const err33 = {instancePath:instancePath+"/rotational_constant",schemaPath:"#/$defs/rotationalConstant/required",keyword:"required",params:{missingProperty: "unit"},message:"must have required property '"+"unit"+"'",schema:schema38.required,parentSchema:schema38,data:data12};
if(vErrors === null){
vErrors = [err33];
}
else {
vErrors.push(err33);
}
errors++;
}
for(const key3 in data12){
if(!((key3 === "value") || (key3 === "unit"))){
const err34 = {instancePath:instancePath+"/rotational_constant",schemaPath:"#/$defs/rotationalConstant/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key3},message:"must NOT have additional properties",schema:false,parentSchema:schema38,data:data12};
if(vErrors === null){
vErrors = [err34];
}
else {
vErrors.push(err34);
}
errors++;
}
}
if(data12.value !== undefined){
let data13 = data12.value;
if((typeof data13 == "number") && (isFinite(data13))){
if(data13 <= 0 || isNaN(data13)){
const err35 = {instancePath:instancePath+"/rotational_constant/value",schemaPath:"#/$defs/rotationalConstant/properties/value/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema38.properties.value,data:data13};
if(vErrors === null){
vErrors = [err35];
}
else {
vErrors.push(err35);
}
errors++;
}
}
else {
const err36 = {instancePath:instancePath+"/rotational_constant/value",schemaPath:"#/$defs/rotationalConstant/properties/value/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema38.properties.value.type,parentSchema:schema38.properties.value,data:data13};
if(vErrors === null){
vErrors = [err36];
}
else {
vErrors.push(err36);
}
errors++;
}
}
if(data12.unit !== undefined){
let data14 = data12.unit;
if(!((((((((data14 === "cm-1") || (data14 === "eV")) || (data14 === "K")) || (data14 === "J/mol")) || (data14 === "kJ/mol")) || (data14 === "kcal/mol")) || (data14 === "MHz")) || (data14 === "GHz"))){
const err37 = {instancePath:instancePath+"/rotational_constant/unit",schemaPath:"#/$defs/rotationalConstant/properties/unit/enum",keyword:"enum",params:{allowedValues: schema38.properties.unit.enum},message:"must be equal to one of the allowed values",schema:schema38.properties.unit.enum,parentSchema:schema38.properties.unit,data:data14};
if(vErrors === null){
vErrors = [err37];
}
else {
vErrors.push(err37);
}
errors++;
}
}
}
}
if(data.potential !== undefined){
if(!(validate26(data.potential, {instancePath:instancePath+"/potential",parentData:data,parentDataProperty:"potential",rootData,dynamicAnchors}))){
vErrors = vErrors === null ? validate26.errors : vErrors.concat(validate26.errors);
errors = vErrors.length;
}
}
}
else {
const err38 = {instancePath,schemaPath:"#/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema46.type,parentSchema:schema46,data};
if(vErrors === null){
vErrors = [err38];
}
else {
vErrors.push(err38);
}
errors++;
}
validate25.errors = vErrors;
return errors === 0;
}
validate25.evaluated = {"props":true,"dynamicProps":false,"dynamicItems":false};

const schema59 = {"title":"{x, g?, alpha?}","description":"Anharmonic constants of a polyatomic, cm-1.","type":"object","additionalProperties":false,"required":["x"],"properties":{"x":{"title":"a list of [i, j, x_ij]","description":"x_ij in cm-1 with 1-based mode indices into vibrations, i <= j, each pair at most once.","type":"array","items":{"$ref":"#/$defs/anharmonicTerm"}},"g":{"title":"a list of [t, t', g_tt']","description":"g_tt' in cm-1 of doubly degenerate modes t <= t' (vibrational angular momentum, + g_tt' l_t l_t'). Default none.","type":"array","items":{"$ref":"#/$defs/anharmonicTerm"},"default":[]},"alpha":{"title":"one list per vibration: [alpha_B] (linear) or [alpha_A, alpha_B, alpha_C] (nonlinear)","description":"Optional vibration-rotation constants in cm-1, one entry per item of vibrations: B_v = B_0 - sum alpha_i v_i.","type":"array","minItems":1,"items":{"title":"[alpha_B] or [alpha_A, alpha_B, alpha_C]","type":"array","minItems":1,"maxItems":3,"items":{"type":"number"}}}}};
const schema60 = {"title":"[i, j, value]: two mode numbers >= 1 (i <= j) and a number in cm-1","type":"array","minItems":3,"maxItems":3,"prefixItems":[{"$ref":"#/$defs/positiveInteger"},{"$ref":"#/$defs/positiveInteger"},{"type":"number"}],"items":false,"description":"One anharmonic constant: 1-based mode indices i <= j into vibrations and the value in cm-1."};

function validate30(data, {instancePath="", parentData, parentDataProperty, rootData=data, dynamicAnchors={}}={}){
let vErrors = null;
let errors = 0;
const evaluated0 = validate30.evaluated;
if(evaluated0.dynamicProps){
evaluated0.props = undefined;
}
if(evaluated0.dynamicItems){
evaluated0.items = undefined;
}
if(Array.isArray(data)){
if(data.length > 3){
const err0 = {instancePath,schemaPath:"#/maxItems",keyword:"maxItems",params:{limit: 3},message:"must NOT have more than 3 items",schema:3,parentSchema:schema60,data};
if(vErrors === null){
vErrors = [err0];
}
else {
vErrors.push(err0);
}
errors++;
}
if(data.length < 3){
const err1 = {instancePath,schemaPath:"#/minItems",keyword:"minItems",params:{limit: 3},message:"must NOT have fewer than 3 items",schema:3,parentSchema:schema60,data};
if(vErrors === null){
vErrors = [err1];
}
else {
vErrors.push(err1);
}
errors++;
}
const len0 = data.length;
if(len0 > 0){
let data0 = data[0];
if(!(((typeof data0 == "number") && (!(data0 % 1) && !isNaN(data0))) && (isFinite(data0)))){
const err2 = {instancePath:instancePath+"/0",schemaPath:"#/$defs/positiveInteger/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema32.type,parentSchema:schema32,data:data0};
if(vErrors === null){
vErrors = [err2];
}
else {
vErrors.push(err2);
}
errors++;
}
if((typeof data0 == "number") && (isFinite(data0))){
if(data0 < 1 || isNaN(data0)){
const err3 = {instancePath:instancePath+"/0",schemaPath:"#/$defs/positiveInteger/minimum",keyword:"minimum",params:{comparison: ">=", limit: 1},message:"must be >= 1",schema:1,parentSchema:schema32,data:data0};
if(vErrors === null){
vErrors = [err3];
}
else {
vErrors.push(err3);
}
errors++;
}
}
}
if(len0 > 1){
let data1 = data[1];
if(!(((typeof data1 == "number") && (!(data1 % 1) && !isNaN(data1))) && (isFinite(data1)))){
const err4 = {instancePath:instancePath+"/1",schemaPath:"#/$defs/positiveInteger/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema32.type,parentSchema:schema32,data:data1};
if(vErrors === null){
vErrors = [err4];
}
else {
vErrors.push(err4);
}
errors++;
}
if((typeof data1 == "number") && (isFinite(data1))){
if(data1 < 1 || isNaN(data1)){
const err5 = {instancePath:instancePath+"/1",schemaPath:"#/$defs/positiveInteger/minimum",keyword:"minimum",params:{comparison: ">=", limit: 1},message:"must be >= 1",schema:1,parentSchema:schema32,data:data1};
if(vErrors === null){
vErrors = [err5];
}
else {
vErrors.push(err5);
}
errors++;
}
}
}
if(len0 > 2){
let data2 = data[2];
if(!((typeof data2 == "number") && (isFinite(data2)))){
const err6 = {instancePath:instancePath+"/2",schemaPath:"#/prefixItems/2/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema60.prefixItems[2].type,parentSchema:schema60.prefixItems[2],data:data2};
if(vErrors === null){
vErrors = [err6];
}
else {
vErrors.push(err6);
}
errors++;
}
}
const len1 = data.length;
if(!(len1 <= 3)){
const err7 = {instancePath,schemaPath:"#/items",keyword:"items",params:{limit: 3},message:"must NOT have more than 3 items",schema:false,parentSchema:schema60,data};
if(vErrors === null){
vErrors = [err7];
}
else {
vErrors.push(err7);
}
errors++;
}
}
else {
const err8 = {instancePath,schemaPath:"#/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema60.type,parentSchema:schema60,data};
if(vErrors === null){
vErrors = [err8];
}
else {
vErrors.push(err8);
}
errors++;
}
validate30.errors = vErrors;
return errors === 0;
}
validate30.evaluated = {"items":true,"dynamicProps":false,"dynamicItems":false};


function validate29(data, {instancePath="", parentData, parentDataProperty, rootData=data, dynamicAnchors={}}={}){
let vErrors = null;
let errors = 0;
const evaluated0 = validate29.evaluated;
if(evaluated0.dynamicProps){
evaluated0.props = undefined;
}
if(evaluated0.dynamicItems){
evaluated0.items = undefined;
}
if(data && typeof data == "object" && !Array.isArray(data)){
if(data.x === undefined){
const err0 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "x"},message:"must have required property '"+"x"+"'",schema:schema59.required,parentSchema:schema59,data};
if(vErrors === null){
vErrors = [err0];
}
else {
vErrors.push(err0);
}
errors++;
}
for(const key0 in data){
if(!(((key0 === "x") || (key0 === "g")) || (key0 === "alpha"))){
const err1 = {instancePath,schemaPath:"#/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key0},message:"must NOT have additional properties",schema:false,parentSchema:schema59,data};
if(vErrors === null){
vErrors = [err1];
}
else {
vErrors.push(err1);
}
errors++;
}
}
if(data.x !== undefined){
let data0 = data.x;
if(Array.isArray(data0)){
const len0 = data0.length;
for(let i0=0; i0<len0; i0++){
if(!(validate30(data0[i0], {instancePath:instancePath+"/x/" + i0,parentData:data0,parentDataProperty:i0,rootData,dynamicAnchors}))){
vErrors = vErrors === null ? validate30.errors : vErrors.concat(validate30.errors);
errors = vErrors.length;
}
}
}
else {
const err2 = {instancePath:instancePath+"/x",schemaPath:"#/properties/x/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema59.properties.x.type,parentSchema:schema59.properties.x,data:data0};
if(vErrors === null){
vErrors = [err2];
}
else {
vErrors.push(err2);
}
errors++;
}
}
if(data.g !== undefined){
let data2 = data.g;
if(Array.isArray(data2)){
const len1 = data2.length;
for(let i1=0; i1<len1; i1++){
if(!(validate30(data2[i1], {instancePath:instancePath+"/g/" + i1,parentData:data2,parentDataProperty:i1,rootData,dynamicAnchors}))){
vErrors = vErrors === null ? validate30.errors : vErrors.concat(validate30.errors);
errors = vErrors.length;
}
}
}
else {
const err3 = {instancePath:instancePath+"/g",schemaPath:"#/properties/g/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema59.properties.g.type,parentSchema:schema59.properties.g,data:data2};
if(vErrors === null){
vErrors = [err3];
}
else {
vErrors.push(err3);
}
errors++;
}
}
if(data.alpha !== undefined){
let data4 = data.alpha;
if(Array.isArray(data4)){
if(data4.length < 1){
const err4 = {instancePath:instancePath+"/alpha",schemaPath:"#/properties/alpha/minItems",keyword:"minItems",params:{limit: 1},message:"must NOT have fewer than 1 items",schema:1,parentSchema:schema59.properties.alpha,data:data4};
if(vErrors === null){
vErrors = [err4];
}
else {
vErrors.push(err4);
}
errors++;
}
const len2 = data4.length;
for(let i2=0; i2<len2; i2++){
let data5 = data4[i2];
if(Array.isArray(data5)){
if(data5.length > 3){
const err5 = {instancePath:instancePath+"/alpha/" + i2,schemaPath:"#/properties/alpha/items/maxItems",keyword:"maxItems",params:{limit: 3},message:"must NOT have more than 3 items",schema:3,parentSchema:schema59.properties.alpha.items,data:data5};
if(vErrors === null){
vErrors = [err5];
}
else {
vErrors.push(err5);
}
errors++;
}
if(data5.length < 1){
const err6 = {instancePath:instancePath+"/alpha/" + i2,schemaPath:"#/properties/alpha/items/minItems",keyword:"minItems",params:{limit: 1},message:"must NOT have fewer than 1 items",schema:1,parentSchema:schema59.properties.alpha.items,data:data5};
if(vErrors === null){
vErrors = [err6];
}
else {
vErrors.push(err6);
}
errors++;
}
const len3 = data5.length;
for(let i3=0; i3<len3; i3++){
let data6 = data5[i3];
if(!((typeof data6 == "number") && (isFinite(data6)))){
const err7 = {instancePath:instancePath+"/alpha/" + i2+"/" + i3,schemaPath:"#/properties/alpha/items/items/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema59.properties.alpha.items.items.type,parentSchema:schema59.properties.alpha.items.items,data:data6};
if(vErrors === null){
vErrors = [err7];
}
else {
vErrors.push(err7);
}
errors++;
}
}
}
else {
const err8 = {instancePath:instancePath+"/alpha/" + i2,schemaPath:"#/properties/alpha/items/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema59.properties.alpha.items.type,parentSchema:schema59.properties.alpha.items,data:data5};
if(vErrors === null){
vErrors = [err8];
}
else {
vErrors.push(err8);
}
errors++;
}
}
}
else {
const err9 = {instancePath:instancePath+"/alpha",schemaPath:"#/properties/alpha/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema59.properties.alpha.type,parentSchema:schema59.properties.alpha,data:data4};
if(vErrors === null){
vErrors = [err9];
}
else {
vErrors.push(err9);
}
errors++;
}
}
}
else {
const err10 = {instancePath,schemaPath:"#/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema59.type,parentSchema:schema59,data};
if(vErrors === null){
vErrors = [err10];
}
else {
vErrors.push(err10);
}
errors++;
}
validate29.errors = vErrors;
return errors === 0;
}
validate29.evaluated = {"props":true,"dynamicProps":false,"dynamicItems":false};

const schema64 = {"title":"a conformer {name, energy, symmetry_number, rotational_constants | moments_of_inertia, vibrations, ...}","description":"One conformer: its energy and the molecular fields of a linear or nonlinear species.","type":"object","additionalProperties":false,"required":["name","energy","vibrations"],"properties":{"name":{"type":"string","minLength":1,"description":"Label of the conformer (unique within the species)."},"energy":{"$ref":"#/$defs/nonNegativeEnergy","description":"Energy of this conformer's lowest level (its zero-point level) above that of the lowest conformer (cm-1 when a bare number); the lowest conformer has 0."},"symmetry_number":{"$ref":"#/$defs/positiveInteger","description":"Rotational symmetry number sigma of this conformer. Required unless a geometry is given (then it follows from the geometry)."},"rotational_constants":{"title":"a list of 1 (linear) or 3 (nonlinear) rotational constants","description":"Rotational constants: [B] for linear, [A, B, C] for nonlinear (conventionally A >= B >= C). Give either this or moments_of_inertia.","type":"array","minItems":1,"maxItems":3,"items":{"$ref":"#/$defs/rotationalConstant"}},"moments_of_inertia":{"title":"a list of 1 (linear) or 3 (nonlinear) moments of inertia","description":"Principal moments of inertia, alternative to rotational_constants: [I] for linear, [IA, IB, IC] for nonlinear; converted with B = h/(8 pi^2 c I).","type":"array","minItems":1,"maxItems":3,"items":{"$ref":"#/$defs/momentOfInertia"}},"geometry":{"title":"a list of atoms [symbol, x, y, z] (angstrom), one row per atom","description":"Optional (linear, nonlinear): Cartesian geometry in angstrom. Symbols are elements (their most abundant isotope), isotopes with the mass number first (13C, 18O, 2H) or D, T. The rotational constants, the linear/nonlinear check, the symmetry number (when symmetry_number is absent) and internal rotors given by axis follow from it; the atoms must match composition. Give at most one of geometry and geometry_file.","type":"array","minItems":2,"items":{"$ref":"#/$defs/geometryRow"}},"geometry_file":{"title":"the name of an XYZ file next to the species file","description":"Optional (linear, nonlinear): like geometry, read from an XYZ file (atom count, comment line, then one 'symbol x y z' line per atom, angstrom) in the species file's folder or below it.","type":"string","minLength":1,"pattern":"^[^/\\\\].*\\.xyz$"},"vibrations":{"title":"a non-empty list of vibrations","description":"Harmonic vibrations (linear, nonlinear): each a wavenumber (bare number in cm-1, or {value, unit}) or {wavenumber, degeneracy}. 3N-5 (linear) or 3N-6 (nonlinear) modes counting degeneracy (internal_rotors count as modes).","type":"array","minItems":1,"items":{"$ref":"#/$defs/vibration"}},"internal_rotors":{"title":"a non-empty list of hindered internal rotors {barrier, symmetry_number, foldedness?, moment_of_inertia | rotational_constant}","description":"Optional (linear, nonlinear): torsions treated as one-dimensional hindered internal rotors with potential V(phi) = (V0/2)(1 - cos n phi), summed over their quantum levels, instead of harmonic vibrations. A torsion listed here must be removed from vibrations (each rotor counts as one of the 3N-6 modes).","type":"array","minItems":1,"items":{"$ref":"#/$defs/internalRotor"}},"electronic_levels":{"title":"a non-empty list of {energy, degeneracy, term?}","description":"Electronic levels (atom, linear, nonlinear). Default: one non-degenerate ground level, [{energy: 0, degeneracy: 1}]. The lowest level must be at energy 0.","type":"array","minItems":1,"items":{"$ref":"#/$defs/electronicLevel"},"default":[{"energy":0,"degeneracy":1}]},"vibration_scale_factor":{"$ref":"#/$defs/vibrationScaleFactor","description":"Optional (linear, nonlinear): a scale factor applied to every wavenumber in vibrations (e.g. for harmonic frequencies of a quantum-chemistry method), with its source; recorded in the model summary. Accepted range 0.75-1.25."},"anharmonicity":{"$ref":"#/$defs/anharmonicity","description":"Optional (linear, nonlinear): anharmonic constants; with them the wavenumbers of vibrations are harmonic omega_i, the rotational constants those of the vibrational ground state, and the vibrational partition function a direct sum over the levels G(v) = sum omega_i (v_i + d_i/2) + sum_{i<=j} x_ij (v_i + d_i/2)(v_j + d_j/2) + sum g_tt' l_t l_t'."},"centrifugal_distortion":{"$ref":"#/$defs/centrifugalDistortion","description":"Optional (linear, nonlinear): quartic centrifugal distortion constants of the ground state, applied as the first-order classical correction to the rotor partition function. Linear: {DJ}; nonlinear: Watson A reduction {DJ, DJK, DK, dJ, dK} (I^r: z = a axis)."},"dissociation_energy":{"$ref":"#/$defs/positiveEnergy","description":"Diatomic, required: D0 of the ground state from its lowest level (v=0, J=0); defines the dissociation limit where the level sums stop (cm-1 when a bare number). Linear and nonlinear, optional, only with anharmonicity: the cut of the anharmonic vibrational level sum above the lowest level."}}};

function validate34(data, {instancePath="", parentData, parentDataProperty, rootData=data, dynamicAnchors={}}={}){
let vErrors = null;
let errors = 0;
const evaluated0 = validate34.evaluated;
if(evaluated0.dynamicProps){
evaluated0.props = undefined;
}
if(evaluated0.dynamicItems){
evaluated0.items = undefined;
}
if(data && typeof data == "object" && !Array.isArray(data)){
if(data.name === undefined){
const err0 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "name"},message:"must have required property '"+"name"+"'",schema:schema64.required,parentSchema:schema64,data};
if(vErrors === null){
vErrors = [err0];
}
else {
vErrors.push(err0);
}
errors++;
}
if(data.energy === undefined){
const err1 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "energy"},message:"must have required property '"+"energy"+"'",schema:schema64.required,parentSchema:schema64,data};
if(vErrors === null){
vErrors = [err1];
}
else {
vErrors.push(err1);
}
errors++;
}
if(data.vibrations === undefined){
const err2 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "vibrations"},message:"must have required property '"+"vibrations"+"'",schema:schema64.required,parentSchema:schema64,data};
if(vErrors === null){
vErrors = [err2];
}
else {
vErrors.push(err2);
}
errors++;
}
for(const key0 in data){
if(!(func1.call(schema64.properties, key0))){
const err3 = {instancePath,schemaPath:"#/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key0},message:"must NOT have additional properties",schema:false,parentSchema:schema64,data};
if(vErrors === null){
vErrors = [err3];
}
else {
vErrors.push(err3);
}
errors++;
}
}
if(data.name !== undefined){
let data0 = data.name;
if(typeof data0 === "string"){
if(func2(data0) < 1){
const err4 = {instancePath:instancePath+"/name",schemaPath:"#/properties/name/minLength",keyword:"minLength",params:{limit: 1},message:"must NOT have fewer than 1 characters",schema:1,parentSchema:schema64.properties.name,data:data0};
if(vErrors === null){
vErrors = [err4];
}
else {
vErrors.push(err4);
}
errors++;
}
}
else {
const err5 = {instancePath:instancePath+"/name",schemaPath:"#/properties/name/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema64.properties.name.type,parentSchema:schema64.properties.name,data:data0};
if(vErrors === null){
vErrors = [err5];
}
else {
vErrors.push(err5);
}
errors++;
}
}
if(data.energy !== undefined){
let data1 = data.energy;
if((!((typeof data1 == "number") && (isFinite(data1)))) && (!(data1 && typeof data1 == "object" && !Array.isArray(data1)))){
const err6 = {instancePath:instancePath+"/energy",schemaPath:"#/$defs/nonNegativeEnergy/type",keyword:"type",params:{type: schema36.type},message:"must be number,object",schema:schema36.type,parentSchema:schema36,data:data1};
if(vErrors === null){
vErrors = [err6];
}
else {
vErrors.push(err6);
}
errors++;
}
if((typeof data1 == "number") && (isFinite(data1))){
if(data1 < 0 || isNaN(data1)){
const err7 = {instancePath:instancePath+"/energy",schemaPath:"#/$defs/nonNegativeEnergy/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema36,data:data1};
if(vErrors === null){
vErrors = [err7];
}
else {
vErrors.push(err7);
}
errors++;
}
}
if(data1 && typeof data1 == "object" && !Array.isArray(data1)){
if(data1.value === undefined){
const err8 = {instancePath:instancePath+"/energy",schemaPath:"#/$defs/nonNegativeEnergy/required",keyword:"required",params:{missingProperty: "value"},message:"must have required property '"+"value"+"'",schema:schema36.required,parentSchema:schema36,data:data1};
if(vErrors === null){
vErrors = [err8];
}
else {
vErrors.push(err8);
}
errors++;
}
if(data1.unit === undefined){
const err9 = {instancePath:instancePath+"/energy",schemaPath:"#/$defs/nonNegativeEnergy/required",keyword:"required",params:{missingProperty: "unit"},message:"must have required property '"+"unit"+"'",schema:schema36.required,parentSchema:schema36,data:data1};
if(vErrors === null){
vErrors = [err9];
}
else {
vErrors.push(err9);
}
errors++;
}
for(const key1 in data1){
if(!((key1 === "value") || (key1 === "unit"))){
const err10 = {instancePath:instancePath+"/energy",schemaPath:"#/$defs/nonNegativeEnergy/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key1},message:"must NOT have additional properties",schema:false,parentSchema:schema36,data:data1};
if(vErrors === null){
vErrors = [err10];
}
else {
vErrors.push(err10);
}
errors++;
}
}
if(data1.value !== undefined){
let data2 = data1.value;
if((typeof data2 == "number") && (isFinite(data2))){
if(data2 < 0 || isNaN(data2)){
const err11 = {instancePath:instancePath+"/energy/value",schemaPath:"#/$defs/nonNegativeEnergy/properties/value/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema36.properties.value,data:data2};
if(vErrors === null){
vErrors = [err11];
}
else {
vErrors.push(err11);
}
errors++;
}
}
else {
const err12 = {instancePath:instancePath+"/energy/value",schemaPath:"#/$defs/nonNegativeEnergy/properties/value/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema36.properties.value.type,parentSchema:schema36.properties.value,data:data2};
if(vErrors === null){
vErrors = [err12];
}
else {
vErrors.push(err12);
}
errors++;
}
}
if(data1.unit !== undefined){
let data3 = data1.unit;
if(!((((((data3 === "cm-1") || (data3 === "eV")) || (data3 === "K")) || (data3 === "J/mol")) || (data3 === "kJ/mol")) || (data3 === "kcal/mol"))){
const err13 = {instancePath:instancePath+"/energy/unit",schemaPath:"#/$defs/nonNegativeEnergy/properties/unit/enum",keyword:"enum",params:{allowedValues: schema36.properties.unit.enum},message:"must be equal to one of the allowed values",schema:schema36.properties.unit.enum,parentSchema:schema36.properties.unit,data:data3};
if(vErrors === null){
vErrors = [err13];
}
else {
vErrors.push(err13);
}
errors++;
}
}
}
}
if(data.symmetry_number !== undefined){
let data4 = data.symmetry_number;
if(!(((typeof data4 == "number") && (!(data4 % 1) && !isNaN(data4))) && (isFinite(data4)))){
const err14 = {instancePath:instancePath+"/symmetry_number",schemaPath:"#/$defs/positiveInteger/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema32.type,parentSchema:schema32,data:data4};
if(vErrors === null){
vErrors = [err14];
}
else {
vErrors.push(err14);
}
errors++;
}
if((typeof data4 == "number") && (isFinite(data4))){
if(data4 < 1 || isNaN(data4)){
const err15 = {instancePath:instancePath+"/symmetry_number",schemaPath:"#/$defs/positiveInteger/minimum",keyword:"minimum",params:{comparison: ">=", limit: 1},message:"must be >= 1",schema:1,parentSchema:schema32,data:data4};
if(vErrors === null){
vErrors = [err15];
}
else {
vErrors.push(err15);
}
errors++;
}
}
}
if(data.rotational_constants !== undefined){
let data5 = data.rotational_constants;
if(Array.isArray(data5)){
if(data5.length > 3){
const err16 = {instancePath:instancePath+"/rotational_constants",schemaPath:"#/properties/rotational_constants/maxItems",keyword:"maxItems",params:{limit: 3},message:"must NOT have more than 3 items",schema:3,parentSchema:schema64.properties.rotational_constants,data:data5};
if(vErrors === null){
vErrors = [err16];
}
else {
vErrors.push(err16);
}
errors++;
}
if(data5.length < 1){
const err17 = {instancePath:instancePath+"/rotational_constants",schemaPath:"#/properties/rotational_constants/minItems",keyword:"minItems",params:{limit: 1},message:"must NOT have fewer than 1 items",schema:1,parentSchema:schema64.properties.rotational_constants,data:data5};
if(vErrors === null){
vErrors = [err17];
}
else {
vErrors.push(err17);
}
errors++;
}
const len0 = data5.length;
for(let i0=0; i0<len0; i0++){
let data6 = data5[i0];
if((!((typeof data6 == "number") && (isFinite(data6)))) && (!(data6 && typeof data6 == "object" && !Array.isArray(data6)))){
const err18 = {instancePath:instancePath+"/rotational_constants/" + i0,schemaPath:"#/$defs/rotationalConstant/type",keyword:"type",params:{type: schema38.type},message:"must be number,object",schema:schema38.type,parentSchema:schema38,data:data6};
if(vErrors === null){
vErrors = [err18];
}
else {
vErrors.push(err18);
}
errors++;
}
if((typeof data6 == "number") && (isFinite(data6))){
if(data6 <= 0 || isNaN(data6)){
const err19 = {instancePath:instancePath+"/rotational_constants/" + i0,schemaPath:"#/$defs/rotationalConstant/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema38,data:data6};
if(vErrors === null){
vErrors = [err19];
}
else {
vErrors.push(err19);
}
errors++;
}
}
if(data6 && typeof data6 == "object" && !Array.isArray(data6)){
if(data6.value === undefined){
const err20 = {instancePath:instancePath+"/rotational_constants/" + i0,schemaPath:"#/$defs/rotationalConstant/required",keyword:"required",params:{missingProperty: "value"},message:"must have required property '"+"value"+"'",schema:schema38.required,parentSchema:schema38,data:data6};
if(vErrors === null){
vErrors = [err20];
}
else {
vErrors.push(err20);
}
errors++;
}
if(data6.unit === undefined){
const err21 = {instancePath:instancePath+"/rotational_constants/" + i0,schemaPath:"#/$defs/rotationalConstant/required",keyword:"required",params:{missingProperty: "unit"},message:"must have required property '"+"unit"+"'",schema:schema38.required,parentSchema:schema38,data:data6};
if(vErrors === null){
vErrors = [err21];
}
else {
vErrors.push(err21);
}
errors++;
}
for(const key2 in data6){
if(!((key2 === "value") || (key2 === "unit"))){
const err22 = {instancePath:instancePath+"/rotational_constants/" + i0,schemaPath:"#/$defs/rotationalConstant/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key2},message:"must NOT have additional properties",schema:false,parentSchema:schema38,data:data6};
if(vErrors === null){
vErrors = [err22];
}
else {
vErrors.push(err22);
}
errors++;
}
}
if(data6.value !== undefined){
let data7 = data6.value;
if((typeof data7 == "number") && (isFinite(data7))){
if(data7 <= 0 || isNaN(data7)){
const err23 = {instancePath:instancePath+"/rotational_constants/" + i0+"/value",schemaPath:"#/$defs/rotationalConstant/properties/value/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema38.properties.value,data:data7};
if(vErrors === null){
vErrors = [err23];
}
else {
vErrors.push(err23);
}
errors++;
}
}
else {
const err24 = {instancePath:instancePath+"/rotational_constants/" + i0+"/value",schemaPath:"#/$defs/rotationalConstant/properties/value/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema38.properties.value.type,parentSchema:schema38.properties.value,data:data7};
if(vErrors === null){
vErrors = [err24];
}
else {
vErrors.push(err24);
}
errors++;
}
}
if(data6.unit !== undefined){
let data8 = data6.unit;
if(!((((((((data8 === "cm-1") || (data8 === "eV")) || (data8 === "K")) || (data8 === "J/mol")) || (data8 === "kJ/mol")) || (data8 === "kcal/mol")) || (data8 === "MHz")) || (data8 === "GHz"))){
const err25 = {instancePath:instancePath+"/rotational_constants/" + i0+"/unit",schemaPath:"#/$defs/rotationalConstant/properties/unit/enum",keyword:"enum",params:{allowedValues: schema38.properties.unit.enum},message:"must be equal to one of the allowed values",schema:schema38.properties.unit.enum,parentSchema:schema38.properties.unit,data:data8};
if(vErrors === null){
vErrors = [err25];
}
else {
vErrors.push(err25);
}
errors++;
}
}
}
}
}
else {
const err26 = {instancePath:instancePath+"/rotational_constants",schemaPath:"#/properties/rotational_constants/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema64.properties.rotational_constants.type,parentSchema:schema64.properties.rotational_constants,data:data5};
if(vErrors === null){
vErrors = [err26];
}
else {
vErrors.push(err26);
}
errors++;
}
}
if(data.moments_of_inertia !== undefined){
let data9 = data.moments_of_inertia;
if(Array.isArray(data9)){
if(data9.length > 3){
const err27 = {instancePath:instancePath+"/moments_of_inertia",schemaPath:"#/properties/moments_of_inertia/maxItems",keyword:"maxItems",params:{limit: 3},message:"must NOT have more than 3 items",schema:3,parentSchema:schema64.properties.moments_of_inertia,data:data9};
if(vErrors === null){
vErrors = [err27];
}
else {
vErrors.push(err27);
}
errors++;
}
if(data9.length < 1){
const err28 = {instancePath:instancePath+"/moments_of_inertia",schemaPath:"#/properties/moments_of_inertia/minItems",keyword:"minItems",params:{limit: 1},message:"must NOT have fewer than 1 items",schema:1,parentSchema:schema64.properties.moments_of_inertia,data:data9};
if(vErrors === null){
vErrors = [err28];
}
else {
vErrors.push(err28);
}
errors++;
}
const len1 = data9.length;
for(let i1=0; i1<len1; i1++){
let data10 = data9[i1];
if((!((typeof data10 == "number") && (isFinite(data10)))) && (!(data10 && typeof data10 == "object" && !Array.isArray(data10)))){
const err29 = {instancePath:instancePath+"/moments_of_inertia/" + i1,schemaPath:"#/$defs/momentOfInertia/type",keyword:"type",params:{type: schema39.type},message:"must be number,object",schema:schema39.type,parentSchema:schema39,data:data10};
if(vErrors === null){
vErrors = [err29];
}
else {
vErrors.push(err29);
}
errors++;
}
if((typeof data10 == "number") && (isFinite(data10))){
if(data10 <= 0 || isNaN(data10)){
const err30 = {instancePath:instancePath+"/moments_of_inertia/" + i1,schemaPath:"#/$defs/momentOfInertia/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema39,data:data10};
if(vErrors === null){
vErrors = [err30];
}
else {
vErrors.push(err30);
}
errors++;
}
}
if(data10 && typeof data10 == "object" && !Array.isArray(data10)){
if(data10.value === undefined){
const err31 = {instancePath:instancePath+"/moments_of_inertia/" + i1,schemaPath:"#/$defs/momentOfInertia/required",keyword:"required",params:{missingProperty: "value"},message:"must have required property '"+"value"+"'",schema:schema39.required,parentSchema:schema39,data:data10};
if(vErrors === null){
vErrors = [err31];
}
else {
vErrors.push(err31);
}
errors++;
}
if(data10.unit === undefined){
const err32 = {instancePath:instancePath+"/moments_of_inertia/" + i1,schemaPath:"#/$defs/momentOfInertia/required",keyword:"required",params:{missingProperty: "unit"},message:"must have required property '"+"unit"+"'",schema:schema39.required,parentSchema:schema39,data:data10};
if(vErrors === null){
vErrors = [err32];
}
else {
vErrors.push(err32);
}
errors++;
}
for(const key3 in data10){
if(!((key3 === "value") || (key3 === "unit"))){
const err33 = {instancePath:instancePath+"/moments_of_inertia/" + i1,schemaPath:"#/$defs/momentOfInertia/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key3},message:"must NOT have additional properties",schema:false,parentSchema:schema39,data:data10};
if(vErrors === null){
vErrors = [err33];
}
else {
vErrors.push(err33);
}
errors++;
}
}
if(data10.value !== undefined){
let data11 = data10.value;
if((typeof data11 == "number") && (isFinite(data11))){
if(data11 <= 0 || isNaN(data11)){
const err34 = {instancePath:instancePath+"/moments_of_inertia/" + i1+"/value",schemaPath:"#/$defs/momentOfInertia/properties/value/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema39.properties.value,data:data11};
if(vErrors === null){
vErrors = [err34];
}
else {
vErrors.push(err34);
}
errors++;
}
}
else {
const err35 = {instancePath:instancePath+"/moments_of_inertia/" + i1+"/value",schemaPath:"#/$defs/momentOfInertia/properties/value/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema39.properties.value.type,parentSchema:schema39.properties.value,data:data11};
if(vErrors === null){
vErrors = [err35];
}
else {
vErrors.push(err35);
}
errors++;
}
}
if(data10.unit !== undefined){
let data12 = data10.unit;
if(!(((data12 === "amu*angstrom^2") || (data12 === "kg*m^2")) || (data12 === "g*cm^2"))){
const err36 = {instancePath:instancePath+"/moments_of_inertia/" + i1+"/unit",schemaPath:"#/$defs/momentOfInertia/properties/unit/enum",keyword:"enum",params:{allowedValues: schema39.properties.unit.enum},message:"must be equal to one of the allowed values",schema:schema39.properties.unit.enum,parentSchema:schema39.properties.unit,data:data12};
if(vErrors === null){
vErrors = [err36];
}
else {
vErrors.push(err36);
}
errors++;
}
}
}
}
}
else {
const err37 = {instancePath:instancePath+"/moments_of_inertia",schemaPath:"#/properties/moments_of_inertia/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema64.properties.moments_of_inertia.type,parentSchema:schema64.properties.moments_of_inertia,data:data9};
if(vErrors === null){
vErrors = [err37];
}
else {
vErrors.push(err37);
}
errors++;
}
}
if(data.geometry !== undefined){
let data13 = data.geometry;
if(Array.isArray(data13)){
if(data13.length < 2){
const err38 = {instancePath:instancePath+"/geometry",schemaPath:"#/properties/geometry/minItems",keyword:"minItems",params:{limit: 2},message:"must NOT have fewer than 2 items",schema:2,parentSchema:schema64.properties.geometry,data:data13};
if(vErrors === null){
vErrors = [err38];
}
else {
vErrors.push(err38);
}
errors++;
}
const len2 = data13.length;
for(let i2=0; i2<len2; i2++){
let data14 = data13[i2];
if(Array.isArray(data14)){
if(data14.length > 4){
const err39 = {instancePath:instancePath+"/geometry/" + i2,schemaPath:"#/$defs/geometryRow/maxItems",keyword:"maxItems",params:{limit: 4},message:"must NOT have more than 4 items",schema:4,parentSchema:schema40,data:data14};
if(vErrors === null){
vErrors = [err39];
}
else {
vErrors.push(err39);
}
errors++;
}
if(data14.length < 4){
const err40 = {instancePath:instancePath+"/geometry/" + i2,schemaPath:"#/$defs/geometryRow/minItems",keyword:"minItems",params:{limit: 4},message:"must NOT have fewer than 4 items",schema:4,parentSchema:schema40,data:data14};
if(vErrors === null){
vErrors = [err40];
}
else {
vErrors.push(err40);
}
errors++;
}
const len3 = data14.length;
if(len3 > 0){
let data15 = data14[0];
if(typeof data15 === "string"){
if(!pattern7.test(data15)){
const err41 = {instancePath:instancePath+"/geometry/" + i2+"/0",schemaPath:"#/$defs/geometryRow/prefixItems/0/pattern",keyword:"pattern",params:{pattern: "^([0-9]{1,3})?[A-Z][a-z]{0,2}$"},message:"must match pattern \""+"^([0-9]{1,3})?[A-Z][a-z]{0,2}$"+"\"",schema:"^([0-9]{1,3})?[A-Z][a-z]{0,2}$",parentSchema:schema40.prefixItems[0],data:data15};
if(vErrors === null){
vErrors = [err41];
}
else {
vErrors.push(err41);
}
errors++;
}
}
else {
const err42 = {instancePath:instancePath+"/geometry/" + i2+"/0",schemaPath:"#/$defs/geometryRow/prefixItems/0/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema40.prefixItems[0].type,parentSchema:schema40.prefixItems[0],data:data15};
if(vErrors === null){
vErrors = [err42];
}
else {
vErrors.push(err42);
}
errors++;
}
}
if(len3 > 1){
let data16 = data14[1];
if(!((typeof data16 == "number") && (isFinite(data16)))){
const err43 = {instancePath:instancePath+"/geometry/" + i2+"/1",schemaPath:"#/$defs/geometryRow/prefixItems/1/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema40.prefixItems[1].type,parentSchema:schema40.prefixItems[1],data:data16};
if(vErrors === null){
vErrors = [err43];
}
else {
vErrors.push(err43);
}
errors++;
}
}
if(len3 > 2){
let data17 = data14[2];
if(!((typeof data17 == "number") && (isFinite(data17)))){
const err44 = {instancePath:instancePath+"/geometry/" + i2+"/2",schemaPath:"#/$defs/geometryRow/prefixItems/2/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema40.prefixItems[2].type,parentSchema:schema40.prefixItems[2],data:data17};
if(vErrors === null){
vErrors = [err44];
}
else {
vErrors.push(err44);
}
errors++;
}
}
if(len3 > 3){
let data18 = data14[3];
if(!((typeof data18 == "number") && (isFinite(data18)))){
const err45 = {instancePath:instancePath+"/geometry/" + i2+"/3",schemaPath:"#/$defs/geometryRow/prefixItems/3/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema40.prefixItems[3].type,parentSchema:schema40.prefixItems[3],data:data18};
if(vErrors === null){
vErrors = [err45];
}
else {
vErrors.push(err45);
}
errors++;
}
}
}
else {
const err46 = {instancePath:instancePath+"/geometry/" + i2,schemaPath:"#/$defs/geometryRow/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema40.type,parentSchema:schema40,data:data14};
if(vErrors === null){
vErrors = [err46];
}
else {
vErrors.push(err46);
}
errors++;
}
}
}
else {
const err47 = {instancePath:instancePath+"/geometry",schemaPath:"#/properties/geometry/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema64.properties.geometry.type,parentSchema:schema64.properties.geometry,data:data13};
if(vErrors === null){
vErrors = [err47];
}
else {
vErrors.push(err47);
}
errors++;
}
}
if(data.geometry_file !== undefined){
let data19 = data.geometry_file;
if(typeof data19 === "string"){
if(func2(data19) < 1){
const err48 = {instancePath:instancePath+"/geometry_file",schemaPath:"#/properties/geometry_file/minLength",keyword:"minLength",params:{limit: 1},message:"must NOT have fewer than 1 characters",schema:1,parentSchema:schema64.properties.geometry_file,data:data19};
if(vErrors === null){
vErrors = [err48];
}
else {
vErrors.push(err48);
}
errors++;
}
if(!pattern8.test(data19)){
const err49 = {instancePath:instancePath+"/geometry_file",schemaPath:"#/properties/geometry_file/pattern",keyword:"pattern",params:{pattern: "^[^/\\\\].*\\.xyz$"},message:"must match pattern \""+"^[^/\\\\].*\\.xyz$"+"\"",schema:"^[^/\\\\].*\\.xyz$",parentSchema:schema64.properties.geometry_file,data:data19};
if(vErrors === null){
vErrors = [err49];
}
else {
vErrors.push(err49);
}
errors++;
}
}
else {
const err50 = {instancePath:instancePath+"/geometry_file",schemaPath:"#/properties/geometry_file/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema64.properties.geometry_file.type,parentSchema:schema64.properties.geometry_file,data:data19};
if(vErrors === null){
vErrors = [err50];
}
else {
vErrors.push(err50);
}
errors++;
}
}
if(data.vibrations !== undefined){
let data20 = data.vibrations;
if(Array.isArray(data20)){
if(data20.length < 1){
const err51 = {instancePath:instancePath+"/vibrations",schemaPath:"#/properties/vibrations/minItems",keyword:"minItems",params:{limit: 1},message:"must NOT have fewer than 1 items",schema:1,parentSchema:schema64.properties.vibrations,data:data20};
if(vErrors === null){
vErrors = [err51];
}
else {
vErrors.push(err51);
}
errors++;
}
const len4 = data20.length;
for(let i3=0; i3<len4; i3++){
if(!(validate23(data20[i3], {instancePath:instancePath+"/vibrations/" + i3,parentData:data20,parentDataProperty:i3,rootData,dynamicAnchors}))){
vErrors = vErrors === null ? validate23.errors : vErrors.concat(validate23.errors);
errors = vErrors.length;
}
}
}
else {
const err52 = {instancePath:instancePath+"/vibrations",schemaPath:"#/properties/vibrations/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema64.properties.vibrations.type,parentSchema:schema64.properties.vibrations,data:data20};
if(vErrors === null){
vErrors = [err52];
}
else {
vErrors.push(err52);
}
errors++;
}
}
if(data.internal_rotors !== undefined){
let data22 = data.internal_rotors;
if(Array.isArray(data22)){
if(data22.length < 1){
const err53 = {instancePath:instancePath+"/internal_rotors",schemaPath:"#/properties/internal_rotors/minItems",keyword:"minItems",params:{limit: 1},message:"must NOT have fewer than 1 items",schema:1,parentSchema:schema64.properties.internal_rotors,data:data22};
if(vErrors === null){
vErrors = [err53];
}
else {
vErrors.push(err53);
}
errors++;
}
const len5 = data22.length;
for(let i4=0; i4<len5; i4++){
if(!(validate25(data22[i4], {instancePath:instancePath+"/internal_rotors/" + i4,parentData:data22,parentDataProperty:i4,rootData,dynamicAnchors}))){
vErrors = vErrors === null ? validate25.errors : vErrors.concat(validate25.errors);
errors = vErrors.length;
}
}
}
else {
const err54 = {instancePath:instancePath+"/internal_rotors",schemaPath:"#/properties/internal_rotors/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema64.properties.internal_rotors.type,parentSchema:schema64.properties.internal_rotors,data:data22};
if(vErrors === null){
vErrors = [err54];
}
else {
vErrors.push(err54);
}
errors++;
}
}
if(data.electronic_levels !== undefined){
let data24 = data.electronic_levels;
if(Array.isArray(data24)){
if(data24.length < 1){
const err55 = {instancePath:instancePath+"/electronic_levels",schemaPath:"#/properties/electronic_levels/minItems",keyword:"minItems",params:{limit: 1},message:"must NOT have fewer than 1 items",schema:1,parentSchema:schema64.properties.electronic_levels,data:data24};
if(vErrors === null){
vErrors = [err55];
}
else {
vErrors.push(err55);
}
errors++;
}
const len6 = data24.length;
for(let i5=0; i5<len6; i5++){
if(!(validate21(data24[i5], {instancePath:instancePath+"/electronic_levels/" + i5,parentData:data24,parentDataProperty:i5,rootData,dynamicAnchors}))){
vErrors = vErrors === null ? validate21.errors : vErrors.concat(validate21.errors);
errors = vErrors.length;
}
}
}
else {
const err56 = {instancePath:instancePath+"/electronic_levels",schemaPath:"#/properties/electronic_levels/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema64.properties.electronic_levels.type,parentSchema:schema64.properties.electronic_levels,data:data24};
if(vErrors === null){
vErrors = [err56];
}
else {
vErrors.push(err56);
}
errors++;
}
}
if(data.vibration_scale_factor !== undefined){
let data26 = data.vibration_scale_factor;
if(data26 && typeof data26 == "object" && !Array.isArray(data26)){
if(data26.value === undefined){
const err57 = {instancePath:instancePath+"/vibration_scale_factor",schemaPath:"#/$defs/vibrationScaleFactor/required",keyword:"required",params:{missingProperty: "value"},message:"must have required property '"+"value"+"'",schema:schema58.required,parentSchema:schema58,data:data26};
if(vErrors === null){
vErrors = [err57];
}
else {
vErrors.push(err57);
}
errors++;
}
if(data26.source === undefined){
const err58 = {instancePath:instancePath+"/vibration_scale_factor",schemaPath:"#/$defs/vibrationScaleFactor/required",keyword:"required",params:{missingProperty: "source"},message:"must have required property '"+"source"+"'",schema:schema58.required,parentSchema:schema58,data:data26};
if(vErrors === null){
vErrors = [err58];
}
else {
vErrors.push(err58);
}
errors++;
}
for(const key4 in data26){
if(!((key4 === "value") || (key4 === "source"))){
const err59 = {instancePath:instancePath+"/vibration_scale_factor",schemaPath:"#/$defs/vibrationScaleFactor/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key4},message:"must NOT have additional properties",schema:false,parentSchema:schema58,data:data26};
if(vErrors === null){
vErrors = [err59];
}
else {
vErrors.push(err59);
}
errors++;
}
}
if(data26.value !== undefined){
let data27 = data26.value;
if((typeof data27 == "number") && (isFinite(data27))){
if(data27 <= 0 || isNaN(data27)){
const err60 = {instancePath:instancePath+"/vibration_scale_factor/value",schemaPath:"#/$defs/vibrationScaleFactor/properties/value/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema58.properties.value,data:data27};
if(vErrors === null){
vErrors = [err60];
}
else {
vErrors.push(err60);
}
errors++;
}
}
else {
const err61 = {instancePath:instancePath+"/vibration_scale_factor/value",schemaPath:"#/$defs/vibrationScaleFactor/properties/value/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema58.properties.value.type,parentSchema:schema58.properties.value,data:data27};
if(vErrors === null){
vErrors = [err61];
}
else {
vErrors.push(err61);
}
errors++;
}
}
if(data26.source !== undefined){
let data28 = data26.source;
if(typeof data28 === "string"){
if(!pattern6.test(data28)){
const err62 = {instancePath:instancePath+"/vibration_scale_factor/source",schemaPath:"#/$defs/vibrationScaleFactor/properties/source/pattern",keyword:"pattern",params:{pattern: "\\S"},message:"must match pattern \""+"\\S"+"\"",schema:"\\S",parentSchema:schema58.properties.source,data:data28};
if(vErrors === null){
vErrors = [err62];
}
else {
vErrors.push(err62);
}
errors++;
}
}
else {
const err63 = {instancePath:instancePath+"/vibration_scale_factor/source",schemaPath:"#/$defs/vibrationScaleFactor/properties/source/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema58.properties.source.type,parentSchema:schema58.properties.source,data:data28};
if(vErrors === null){
vErrors = [err63];
}
else {
vErrors.push(err63);
}
errors++;
}
}
}
else {
const err64 = {instancePath:instancePath+"/vibration_scale_factor",schemaPath:"#/$defs/vibrationScaleFactor/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema58.type,parentSchema:schema58,data:data26};
if(vErrors === null){
vErrors = [err64];
}
else {
vErrors.push(err64);
}
errors++;
}
}
if(data.anharmonicity !== undefined){
if(!(validate29(data.anharmonicity, {instancePath:instancePath+"/anharmonicity",parentData:data,parentDataProperty:"anharmonicity",rootData,dynamicAnchors}))){
vErrors = vErrors === null ? validate29.errors : vErrors.concat(validate29.errors);
errors = vErrors.length;
}
}
if(data.centrifugal_distortion !== undefined){
let data30 = data.centrifugal_distortion;
if(data30 && typeof data30 == "object" && !Array.isArray(data30)){
if(data30.DJ === undefined){
const err65 = {instancePath:instancePath+"/centrifugal_distortion",schemaPath:"#/$defs/centrifugalDistortion/required",keyword:"required",params:{missingProperty: "DJ"},message:"must have required property '"+"DJ"+"'",schema:schema63.required,parentSchema:schema63,data:data30};
if(vErrors === null){
vErrors = [err65];
}
else {
vErrors.push(err65);
}
errors++;
}
for(const key5 in data30){
if(!(((((key5 === "DJ") || (key5 === "DJK")) || (key5 === "DK")) || (key5 === "dJ")) || (key5 === "dK"))){
const err66 = {instancePath:instancePath+"/centrifugal_distortion",schemaPath:"#/$defs/centrifugalDistortion/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key5},message:"must NOT have additional properties",schema:false,parentSchema:schema63,data:data30};
if(vErrors === null){
vErrors = [err66];
}
else {
vErrors.push(err66);
}
errors++;
}
}
if(data30.DJ !== undefined){
let data31 = data30.DJ;
if(!((typeof data31 == "number") && (isFinite(data31)))){
const err67 = {instancePath:instancePath+"/centrifugal_distortion/DJ",schemaPath:"#/$defs/centrifugalDistortion/properties/DJ/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema63.properties.DJ.type,parentSchema:schema63.properties.DJ,data:data31};
if(vErrors === null){
vErrors = [err67];
}
else {
vErrors.push(err67);
}
errors++;
}
}
if(data30.DJK !== undefined){
let data32 = data30.DJK;
if(!((typeof data32 == "number") && (isFinite(data32)))){
const err68 = {instancePath:instancePath+"/centrifugal_distortion/DJK",schemaPath:"#/$defs/centrifugalDistortion/properties/DJK/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema63.properties.DJK.type,parentSchema:schema63.properties.DJK,data:data32};
if(vErrors === null){
vErrors = [err68];
}
else {
vErrors.push(err68);
}
errors++;
}
}
if(data30.DK !== undefined){
let data33 = data30.DK;
if(!((typeof data33 == "number") && (isFinite(data33)))){
const err69 = {instancePath:instancePath+"/centrifugal_distortion/DK",schemaPath:"#/$defs/centrifugalDistortion/properties/DK/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema63.properties.DK.type,parentSchema:schema63.properties.DK,data:data33};
if(vErrors === null){
vErrors = [err69];
}
else {
vErrors.push(err69);
}
errors++;
}
}
if(data30.dJ !== undefined){
let data34 = data30.dJ;
if(!((typeof data34 == "number") && (isFinite(data34)))){
const err70 = {instancePath:instancePath+"/centrifugal_distortion/dJ",schemaPath:"#/$defs/centrifugalDistortion/properties/dJ/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema63.properties.dJ.type,parentSchema:schema63.properties.dJ,data:data34};
if(vErrors === null){
vErrors = [err70];
}
else {
vErrors.push(err70);
}
errors++;
}
}
if(data30.dK !== undefined){
let data35 = data30.dK;
if(!((typeof data35 == "number") && (isFinite(data35)))){
const err71 = {instancePath:instancePath+"/centrifugal_distortion/dK",schemaPath:"#/$defs/centrifugalDistortion/properties/dK/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema63.properties.dK.type,parentSchema:schema63.properties.dK,data:data35};
if(vErrors === null){
vErrors = [err71];
}
else {
vErrors.push(err71);
}
errors++;
}
}
}
else {
const err72 = {instancePath:instancePath+"/centrifugal_distortion",schemaPath:"#/$defs/centrifugalDistortion/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema63.type,parentSchema:schema63,data:data30};
if(vErrors === null){
vErrors = [err72];
}
else {
vErrors.push(err72);
}
errors++;
}
}
if(data.dissociation_energy !== undefined){
let data36 = data.dissociation_energy;
if((!((typeof data36 == "number") && (isFinite(data36)))) && (!(data36 && typeof data36 == "object" && !Array.isArray(data36)))){
const err73 = {instancePath:instancePath+"/dissociation_energy",schemaPath:"#/$defs/positiveEnergy/type",keyword:"type",params:{type: schema72.type},message:"must be number,object",schema:schema72.type,parentSchema:schema72,data:data36};
if(vErrors === null){
vErrors = [err73];
}
else {
vErrors.push(err73);
}
errors++;
}
if((typeof data36 == "number") && (isFinite(data36))){
if(data36 <= 0 || isNaN(data36)){
const err74 = {instancePath:instancePath+"/dissociation_energy",schemaPath:"#/$defs/positiveEnergy/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema72,data:data36};
if(vErrors === null){
vErrors = [err74];
}
else {
vErrors.push(err74);
}
errors++;
}
}
if(data36 && typeof data36 == "object" && !Array.isArray(data36)){
if(data36.value === undefined){
const err75 = {instancePath:instancePath+"/dissociation_energy",schemaPath:"#/$defs/positiveEnergy/required",keyword:"required",params:{missingProperty: "value"},message:"must have required property '"+"value"+"'",schema:schema72.required,parentSchema:schema72,data:data36};
if(vErrors === null){
vErrors = [err75];
}
else {
vErrors.push(err75);
}
errors++;
}
if(data36.unit === undefined){
const err76 = {instancePath:instancePath+"/dissociation_energy",schemaPath:"#/$defs/positiveEnergy/required",keyword:"required",params:{missingProperty: "unit"},message:"must have required property '"+"unit"+"'",schema:schema72.required,parentSchema:schema72,data:data36};
if(vErrors === null){
vErrors = [err76];
}
else {
vErrors.push(err76);
}
errors++;
}
for(const key6 in data36){
if(!((key6 === "value") || (key6 === "unit"))){
const err77 = {instancePath:instancePath+"/dissociation_energy",schemaPath:"#/$defs/positiveEnergy/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key6},message:"must NOT have additional properties",schema:false,parentSchema:schema72,data:data36};
if(vErrors === null){
vErrors = [err77];
}
else {
vErrors.push(err77);
}
errors++;
}
}
if(data36.value !== undefined){
let data37 = data36.value;
if((typeof data37 == "number") && (isFinite(data37))){
if(data37 <= 0 || isNaN(data37)){
const err78 = {instancePath:instancePath+"/dissociation_energy/value",schemaPath:"#/$defs/positiveEnergy/properties/value/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema72.properties.value,data:data37};
if(vErrors === null){
vErrors = [err78];
}
else {
vErrors.push(err78);
}
errors++;
}
}
else {
const err79 = {instancePath:instancePath+"/dissociation_energy/value",schemaPath:"#/$defs/positiveEnergy/properties/value/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema72.properties.value.type,parentSchema:schema72.properties.value,data:data37};
if(vErrors === null){
vErrors = [err79];
}
else {
vErrors.push(err79);
}
errors++;
}
}
if(data36.unit !== undefined){
let data38 = data36.unit;
if(!((((((data38 === "cm-1") || (data38 === "eV")) || (data38 === "K")) || (data38 === "J/mol")) || (data38 === "kJ/mol")) || (data38 === "kcal/mol"))){
const err80 = {instancePath:instancePath+"/dissociation_energy/unit",schemaPath:"#/$defs/positiveEnergy/properties/unit/enum",keyword:"enum",params:{allowedValues: schema72.properties.unit.enum},message:"must be equal to one of the allowed values",schema:schema72.properties.unit.enum,parentSchema:schema72.properties.unit,data:data38};
if(vErrors === null){
vErrors = [err80];
}
else {
vErrors.push(err80);
}
errors++;
}
}
}
}
}
else {
const err81 = {instancePath,schemaPath:"#/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema64.type,parentSchema:schema64,data};
if(vErrors === null){
vErrors = [err81];
}
else {
vErrors.push(err81);
}
errors++;
}
validate34.errors = vErrors;
return errors === 0;
}
validate34.evaluated = {"props":true,"dynamicProps":false,"dynamicItems":false};

const schema74 = {"title":"a diatomic electronic state {term, energy, degeneracy, we, Be, ...}","description":"One electronic state of a diatomic molecule with its spectroscopic constants (Huber & Herzberg notation). Term values E(v,J) = Te + G(v) + B_v x - D_v x^2 + H_v x^3 with x = J(J+1), G(v) = we(v+1/2) - wexe(v+1/2)^2 + weye(v+1/2)^3 + weze(v+1/2)^4, B_v = Be - alphae(v+1/2) + gammae(v+1/2)^2, D_v = De + betae(v+1/2), H_v = He; the higher-order constants weze, gammae, betae, He are optional (0 when absent).","type":"object","additionalProperties":false,"required":["term","energy","degeneracy","we","Be"],"properties":{"term":{"type":"string","minLength":1,"description":"Term symbol or label, e.g. 'X1Sigma_g+'."},"energy":{"$ref":"#/$defs/nonNegativeEnergy","description":"Te: energy of the potential minimum above the ground-state minimum (cm-1 when a bare number). 0 for the ground state, which must come first."},"degeneracy":{"$ref":"#/$defs/positiveInteger","description":"Electronic degeneracy: spin multiplicity times 2 for Lambda > 0."},"we":{"$ref":"#/$defs/positiveEnergy","description":"Harmonic wavenumber omega_e (cm-1 when a bare number)."},"wexe":{"$ref":"#/$defs/energy","description":"Anharmonicity omega_e x_e (cm-1 when a bare number). Default 0.","default":0},"weye":{"$ref":"#/$defs/energy","description":"Second anharmonicity omega_e y_e (cm-1 when a bare number). Default 0.","default":0},"weze":{"$ref":"#/$defs/energy","description":"Third anharmonicity omega_e z_e (cm-1 when a bare number): adds + weze(v+1/2)^4 to G(v). Optional; default 0 (then G(v) has three terms). Huber & Herzberg (1979) notation.","default":0},"Be":{"$ref":"#/$defs/rotationalConstant","description":"Equilibrium rotational constant B_e (cm-1 when a bare number)."},"alphae":{"$ref":"#/$defs/rotationalTerm","description":"Vibration-rotation coupling alpha_e (cm-1 when a bare number). Default 0.","default":0},"gammae":{"$ref":"#/$defs/rotationalTerm","description":"Second vibration-rotation constant gamma_e (cm-1 when a bare number): B_v = Be - alphae(v+1/2) + gammae(v+1/2)^2. Either sign; usually a few percent of alphae or less. Optional; default 0.","default":0},"De":{"$ref":"#/$defs/nonNegativeRotationalTerm","description":"Centrifugal distortion constant D_e (cm-1 when a bare number). Default 0.","default":0},"betae":{"$ref":"#/$defs/rotationalTerm","description":"Vibrational dependence of the centrifugal distortion beta_e (cm-1 when a bare number): D_v = De + betae(v+1/2). Either sign; usually a few percent of De or less, and D_0 = De + betae/2 may not be negative. Optional; default 0.","default":0},"He":{"$ref":"#/$defs/rotationalTerm","description":"Sextic centrifugal distortion constant H_e (cm-1 when a bare number): adds + He J^3(J+1)^3 to every level (H_v = He for all v; Huber & Herzberg sign convention; its sign is usually that of 12 Be^2 - alphae we, the estimate H_e = 2De(12Be^2 - alphae we)/(3we^2) of Herzberg 1950). Optional; default 0. With He > 0 the J ladders may no longer turn over below the dissociation limit.","default":0},"dissociation_energy":{"$ref":"#/$defs/positiveEnergy","description":"D0 of this state from its own lowest level (cm-1 when a bare number). When absent the state shares the molecule's dissociation limit."}}};
const schema78 = {"title":"a number in cm-1, or {value, unit}","description":"An energy or wavenumber of any sign. A bare number is in cm-1; or {value, unit} with unit one of cm-1, eV, K, J/mol, kJ/mol, kcal/mol (per particle for cm-1, eV, K; per mole for the molar units).","type":["number","object"],"properties":{"value":{"type":"number","description":"Numeric value in `unit`."},"unit":{"description":"Unit of `value`.","enum":["cm-1","eV","K","J/mol","kJ/mol","kcal/mol"]}},"required":["value","unit"],"additionalProperties":false};
const schema82 = {"title":"a number in cm-1, or {value, unit}","description":"A rotational-type constant of any sign (e.g. alphae). A bare number is in cm-1; or {value, unit} with unit one of cm-1, eV, K, J/mol, kJ/mol, kcal/mol, MHz, GHz.","type":["number","object"],"properties":{"value":{"type":"number","description":"Numeric value in `unit`."},"unit":{"description":"Unit of `value`.","enum":["cm-1","eV","K","J/mol","kJ/mol","kcal/mol","MHz","GHz"]}},"required":["value","unit"],"additionalProperties":false};
const schema84 = {"title":"a number >= 0 in cm-1, or {value, unit} with value >= 0","description":"A rotational-type constant, zero or positive (e.g. the centrifugal distortion De). A bare number is in cm-1; or {value, unit} with unit one of cm-1, eV, K, J/mol, kJ/mol, kcal/mol, MHz, GHz.","type":["number","object"],"minimum":0,"properties":{"value":{"type":"number","description":"Numeric value in `unit`.","minimum":0},"unit":{"description":"Unit of `value`.","enum":["cm-1","eV","K","J/mol","kJ/mol","kcal/mol","MHz","GHz"]}},"required":["value","unit"],"additionalProperties":false};

function validate40(data, {instancePath="", parentData, parentDataProperty, rootData=data, dynamicAnchors={}}={}){
let vErrors = null;
let errors = 0;
const evaluated0 = validate40.evaluated;
if(evaluated0.dynamicProps){
evaluated0.props = undefined;
}
if(evaluated0.dynamicItems){
evaluated0.items = undefined;
}
if(data && typeof data == "object" && !Array.isArray(data)){
if(data.term === undefined){
const err0 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "term"},message:"must have required property '"+"term"+"'",schema:schema74.required,parentSchema:schema74,data};
if(vErrors === null){
vErrors = [err0];
}
else {
vErrors.push(err0);
}
errors++;
}
if(data.energy === undefined){
const err1 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "energy"},message:"must have required property '"+"energy"+"'",schema:schema74.required,parentSchema:schema74,data};
if(vErrors === null){
vErrors = [err1];
}
else {
vErrors.push(err1);
}
errors++;
}
if(data.degeneracy === undefined){
const err2 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "degeneracy"},message:"must have required property '"+"degeneracy"+"'",schema:schema74.required,parentSchema:schema74,data};
if(vErrors === null){
vErrors = [err2];
}
else {
vErrors.push(err2);
}
errors++;
}
if(data.we === undefined){
const err3 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "we"},message:"must have required property '"+"we"+"'",schema:schema74.required,parentSchema:schema74,data};
if(vErrors === null){
vErrors = [err3];
}
else {
vErrors.push(err3);
}
errors++;
}
if(data.Be === undefined){
const err4 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "Be"},message:"must have required property '"+"Be"+"'",schema:schema74.required,parentSchema:schema74,data};
if(vErrors === null){
vErrors = [err4];
}
else {
vErrors.push(err4);
}
errors++;
}
for(const key0 in data){
if(!(func1.call(schema74.properties, key0))){
const err5 = {instancePath,schemaPath:"#/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key0},message:"must NOT have additional properties",schema:false,parentSchema:schema74,data};
if(vErrors === null){
vErrors = [err5];
}
else {
vErrors.push(err5);
}
errors++;
}
}
if(data.term !== undefined){
let data0 = data.term;
if(typeof data0 === "string"){
if(func2(data0) < 1){
const err6 = {instancePath:instancePath+"/term",schemaPath:"#/properties/term/minLength",keyword:"minLength",params:{limit: 1},message:"must NOT have fewer than 1 characters",schema:1,parentSchema:schema74.properties.term,data:data0};
if(vErrors === null){
vErrors = [err6];
}
else {
vErrors.push(err6);
}
errors++;
}
}
else {
const err7 = {instancePath:instancePath+"/term",schemaPath:"#/properties/term/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema74.properties.term.type,parentSchema:schema74.properties.term,data:data0};
if(vErrors === null){
vErrors = [err7];
}
else {
vErrors.push(err7);
}
errors++;
}
}
if(data.energy !== undefined){
let data1 = data.energy;
if((!((typeof data1 == "number") && (isFinite(data1)))) && (!(data1 && typeof data1 == "object" && !Array.isArray(data1)))){
const err8 = {instancePath:instancePath+"/energy",schemaPath:"#/$defs/nonNegativeEnergy/type",keyword:"type",params:{type: schema36.type},message:"must be number,object",schema:schema36.type,parentSchema:schema36,data:data1};
if(vErrors === null){
vErrors = [err8];
}
else {
vErrors.push(err8);
}
errors++;
}
if((typeof data1 == "number") && (isFinite(data1))){
if(data1 < 0 || isNaN(data1)){
const err9 = {instancePath:instancePath+"/energy",schemaPath:"#/$defs/nonNegativeEnergy/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema36,data:data1};
if(vErrors === null){
vErrors = [err9];
}
else {
vErrors.push(err9);
}
errors++;
}
}
if(data1 && typeof data1 == "object" && !Array.isArray(data1)){
if(data1.value === undefined){
const err10 = {instancePath:instancePath+"/energy",schemaPath:"#/$defs/nonNegativeEnergy/required",keyword:"required",params:{missingProperty: "value"},message:"must have required property '"+"value"+"'",schema:schema36.required,parentSchema:schema36,data:data1};
if(vErrors === null){
vErrors = [err10];
}
else {
vErrors.push(err10);
}
errors++;
}
if(data1.unit === undefined){
const err11 = {instancePath:instancePath+"/energy",schemaPath:"#/$defs/nonNegativeEnergy/required",keyword:"required",params:{missingProperty: "unit"},message:"must have required property '"+"unit"+"'",schema:schema36.required,parentSchema:schema36,data:data1};
if(vErrors === null){
vErrors = [err11];
}
else {
vErrors.push(err11);
}
errors++;
}
for(const key1 in data1){
if(!((key1 === "value") || (key1 === "unit"))){
const err12 = {instancePath:instancePath+"/energy",schemaPath:"#/$defs/nonNegativeEnergy/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key1},message:"must NOT have additional properties",schema:false,parentSchema:schema36,data:data1};
if(vErrors === null){
vErrors = [err12];
}
else {
vErrors.push(err12);
}
errors++;
}
}
if(data1.value !== undefined){
let data2 = data1.value;
if((typeof data2 == "number") && (isFinite(data2))){
if(data2 < 0 || isNaN(data2)){
const err13 = {instancePath:instancePath+"/energy/value",schemaPath:"#/$defs/nonNegativeEnergy/properties/value/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema36.properties.value,data:data2};
if(vErrors === null){
vErrors = [err13];
}
else {
vErrors.push(err13);
}
errors++;
}
}
else {
const err14 = {instancePath:instancePath+"/energy/value",schemaPath:"#/$defs/nonNegativeEnergy/properties/value/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema36.properties.value.type,parentSchema:schema36.properties.value,data:data2};
if(vErrors === null){
vErrors = [err14];
}
else {
vErrors.push(err14);
}
errors++;
}
}
if(data1.unit !== undefined){
let data3 = data1.unit;
if(!((((((data3 === "cm-1") || (data3 === "eV")) || (data3 === "K")) || (data3 === "J/mol")) || (data3 === "kJ/mol")) || (data3 === "kcal/mol"))){
const err15 = {instancePath:instancePath+"/energy/unit",schemaPath:"#/$defs/nonNegativeEnergy/properties/unit/enum",keyword:"enum",params:{allowedValues: schema36.properties.unit.enum},message:"must be equal to one of the allowed values",schema:schema36.properties.unit.enum,parentSchema:schema36.properties.unit,data:data3};
if(vErrors === null){
vErrors = [err15];
}
else {
vErrors.push(err15);
}
errors++;
}
}
}
}
if(data.degeneracy !== undefined){
let data4 = data.degeneracy;
if(!(((typeof data4 == "number") && (!(data4 % 1) && !isNaN(data4))) && (isFinite(data4)))){
const err16 = {instancePath:instancePath+"/degeneracy",schemaPath:"#/$defs/positiveInteger/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema32.type,parentSchema:schema32,data:data4};
if(vErrors === null){
vErrors = [err16];
}
else {
vErrors.push(err16);
}
errors++;
}
if((typeof data4 == "number") && (isFinite(data4))){
if(data4 < 1 || isNaN(data4)){
const err17 = {instancePath:instancePath+"/degeneracy",schemaPath:"#/$defs/positiveInteger/minimum",keyword:"minimum",params:{comparison: ">=", limit: 1},message:"must be >= 1",schema:1,parentSchema:schema32,data:data4};
if(vErrors === null){
vErrors = [err17];
}
else {
vErrors.push(err17);
}
errors++;
}
}
}
if(data.we !== undefined){
let data5 = data.we;
if((!((typeof data5 == "number") && (isFinite(data5)))) && (!(data5 && typeof data5 == "object" && !Array.isArray(data5)))){
const err18 = {instancePath:instancePath+"/we",schemaPath:"#/$defs/positiveEnergy/type",keyword:"type",params:{type: schema72.type},message:"must be number,object",schema:schema72.type,parentSchema:schema72,data:data5};
if(vErrors === null){
vErrors = [err18];
}
else {
vErrors.push(err18);
}
errors++;
}
if((typeof data5 == "number") && (isFinite(data5))){
if(data5 <= 0 || isNaN(data5)){
const err19 = {instancePath:instancePath+"/we",schemaPath:"#/$defs/positiveEnergy/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema72,data:data5};
if(vErrors === null){
vErrors = [err19];
}
else {
vErrors.push(err19);
}
errors++;
}
}
if(data5 && typeof data5 == "object" && !Array.isArray(data5)){
if(data5.value === undefined){
const err20 = {instancePath:instancePath+"/we",schemaPath:"#/$defs/positiveEnergy/required",keyword:"required",params:{missingProperty: "value"},message:"must have required property '"+"value"+"'",schema:schema72.required,parentSchema:schema72,data:data5};
if(vErrors === null){
vErrors = [err20];
}
else {
vErrors.push(err20);
}
errors++;
}
if(data5.unit === undefined){
const err21 = {instancePath:instancePath+"/we",schemaPath:"#/$defs/positiveEnergy/required",keyword:"required",params:{missingProperty: "unit"},message:"must have required property '"+"unit"+"'",schema:schema72.required,parentSchema:schema72,data:data5};
if(vErrors === null){
vErrors = [err21];
}
else {
vErrors.push(err21);
}
errors++;
}
for(const key2 in data5){
if(!((key2 === "value") || (key2 === "unit"))){
const err22 = {instancePath:instancePath+"/we",schemaPath:"#/$defs/positiveEnergy/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key2},message:"must NOT have additional properties",schema:false,parentSchema:schema72,data:data5};
if(vErrors === null){
vErrors = [err22];
}
else {
vErrors.push(err22);
}
errors++;
}
}
if(data5.value !== undefined){
let data6 = data5.value;
if((typeof data6 == "number") && (isFinite(data6))){
if(data6 <= 0 || isNaN(data6)){
const err23 = {instancePath:instancePath+"/we/value",schemaPath:"#/$defs/positiveEnergy/properties/value/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema72.properties.value,data:data6};
if(vErrors === null){
vErrors = [err23];
}
else {
vErrors.push(err23);
}
errors++;
}
}
else {
const err24 = {instancePath:instancePath+"/we/value",schemaPath:"#/$defs/positiveEnergy/properties/value/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema72.properties.value.type,parentSchema:schema72.properties.value,data:data6};
if(vErrors === null){
vErrors = [err24];
}
else {
vErrors.push(err24);
}
errors++;
}
}
if(data5.unit !== undefined){
let data7 = data5.unit;
if(!((((((data7 === "cm-1") || (data7 === "eV")) || (data7 === "K")) || (data7 === "J/mol")) || (data7 === "kJ/mol")) || (data7 === "kcal/mol"))){
const err25 = {instancePath:instancePath+"/we/unit",schemaPath:"#/$defs/positiveEnergy/properties/unit/enum",keyword:"enum",params:{allowedValues: schema72.properties.unit.enum},message:"must be equal to one of the allowed values",schema:schema72.properties.unit.enum,parentSchema:schema72.properties.unit,data:data7};
if(vErrors === null){
vErrors = [err25];
}
else {
vErrors.push(err25);
}
errors++;
}
}
}
}
if(data.wexe !== undefined){
let data8 = data.wexe;
if((!((typeof data8 == "number") && (isFinite(data8)))) && (!(data8 && typeof data8 == "object" && !Array.isArray(data8)))){
const err26 = {instancePath:instancePath+"/wexe",schemaPath:"#/$defs/energy/type",keyword:"type",params:{type: schema78.type},message:"must be number,object",schema:schema78.type,parentSchema:schema78,data:data8};
if(vErrors === null){
vErrors = [err26];
}
else {
vErrors.push(err26);
}
errors++;
}
if(data8 && typeof data8 == "object" && !Array.isArray(data8)){
if(data8.value === undefined){
const err27 = {instancePath:instancePath+"/wexe",schemaPath:"#/$defs/energy/required",keyword:"required",params:{missingProperty: "value"},message:"must have required property '"+"value"+"'",schema:schema78.required,parentSchema:schema78,data:data8};
if(vErrors === null){
vErrors = [err27];
}
else {
vErrors.push(err27);
}
errors++;
}
if(data8.unit === undefined){
const err28 = {instancePath:instancePath+"/wexe",schemaPath:"#/$defs/energy/required",keyword:"required",params:{missingProperty: "unit"},message:"must have required property '"+"unit"+"'",schema:schema78.required,parentSchema:schema78,data:data8};
if(vErrors === null){
vErrors = [err28];
}
else {
vErrors.push(err28);
}
errors++;
}
for(const key3 in data8){
if(!((key3 === "value") || (key3 === "unit"))){
const err29 = {instancePath:instancePath+"/wexe",schemaPath:"#/$defs/energy/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key3},message:"must NOT have additional properties",schema:false,parentSchema:schema78,data:data8};
if(vErrors === null){
vErrors = [err29];
}
else {
vErrors.push(err29);
}
errors++;
}
}
if(data8.value !== undefined){
let data9 = data8.value;
if(!((typeof data9 == "number") && (isFinite(data9)))){
const err30 = {instancePath:instancePath+"/wexe/value",schemaPath:"#/$defs/energy/properties/value/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema78.properties.value.type,parentSchema:schema78.properties.value,data:data9};
if(vErrors === null){
vErrors = [err30];
}
else {
vErrors.push(err30);
}
errors++;
}
}
if(data8.unit !== undefined){
let data10 = data8.unit;
if(!((((((data10 === "cm-1") || (data10 === "eV")) || (data10 === "K")) || (data10 === "J/mol")) || (data10 === "kJ/mol")) || (data10 === "kcal/mol"))){
const err31 = {instancePath:instancePath+"/wexe/unit",schemaPath:"#/$defs/energy/properties/unit/enum",keyword:"enum",params:{allowedValues: schema78.properties.unit.enum},message:"must be equal to one of the allowed values",schema:schema78.properties.unit.enum,parentSchema:schema78.properties.unit,data:data10};
if(vErrors === null){
vErrors = [err31];
}
else {
vErrors.push(err31);
}
errors++;
}
}
}
}
if(data.weye !== undefined){
let data11 = data.weye;
if((!((typeof data11 == "number") && (isFinite(data11)))) && (!(data11 && typeof data11 == "object" && !Array.isArray(data11)))){
const err32 = {instancePath:instancePath+"/weye",schemaPath:"#/$defs/energy/type",keyword:"type",params:{type: schema78.type},message:"must be number,object",schema:schema78.type,parentSchema:schema78,data:data11};
if(vErrors === null){
vErrors = [err32];
}
else {
vErrors.push(err32);
}
errors++;
}
if(data11 && typeof data11 == "object" && !Array.isArray(data11)){
if(data11.value === undefined){
const err33 = {instancePath:instancePath+"/weye",schemaPath:"#/$defs/energy/required",keyword:"required",params:{missingProperty: "value"},message:"must have required property '"+"value"+"'",schema:schema78.required,parentSchema:schema78,data:data11};
if(vErrors === null){
vErrors = [err33];
}
else {
vErrors.push(err33);
}
errors++;
}
if(data11.unit === undefined){
const err34 = {instancePath:instancePath+"/weye",schemaPath:"#/$defs/energy/required",keyword:"required",params:{missingProperty: "unit"},message:"must have required property '"+"unit"+"'",schema:schema78.required,parentSchema:schema78,data:data11};
if(vErrors === null){
vErrors = [err34];
}
else {
vErrors.push(err34);
}
errors++;
}
for(const key4 in data11){
if(!((key4 === "value") || (key4 === "unit"))){
const err35 = {instancePath:instancePath+"/weye",schemaPath:"#/$defs/energy/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key4},message:"must NOT have additional properties",schema:false,parentSchema:schema78,data:data11};
if(vErrors === null){
vErrors = [err35];
}
else {
vErrors.push(err35);
}
errors++;
}
}
if(data11.value !== undefined){
let data12 = data11.value;
if(!((typeof data12 == "number") && (isFinite(data12)))){
const err36 = {instancePath:instancePath+"/weye/value",schemaPath:"#/$defs/energy/properties/value/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema78.properties.value.type,parentSchema:schema78.properties.value,data:data12};
if(vErrors === null){
vErrors = [err36];
}
else {
vErrors.push(err36);
}
errors++;
}
}
if(data11.unit !== undefined){
let data13 = data11.unit;
if(!((((((data13 === "cm-1") || (data13 === "eV")) || (data13 === "K")) || (data13 === "J/mol")) || (data13 === "kJ/mol")) || (data13 === "kcal/mol"))){
const err37 = {instancePath:instancePath+"/weye/unit",schemaPath:"#/$defs/energy/properties/unit/enum",keyword:"enum",params:{allowedValues: schema78.properties.unit.enum},message:"must be equal to one of the allowed values",schema:schema78.properties.unit.enum,parentSchema:schema78.properties.unit,data:data13};
if(vErrors === null){
vErrors = [err37];
}
else {
vErrors.push(err37);
}
errors++;
}
}
}
}
if(data.weze !== undefined){
let data14 = data.weze;
if((!((typeof data14 == "number") && (isFinite(data14)))) && (!(data14 && typeof data14 == "object" && !Array.isArray(data14)))){
const err38 = {instancePath:instancePath+"/weze",schemaPath:"#/$defs/energy/type",keyword:"type",params:{type: schema78.type},message:"must be number,object",schema:schema78.type,parentSchema:schema78,data:data14};
if(vErrors === null){
vErrors = [err38];
}
else {
vErrors.push(err38);
}
errors++;
}
if(data14 && typeof data14 == "object" && !Array.isArray(data14)){
if(data14.value === undefined){
const err39 = {instancePath:instancePath+"/weze",schemaPath:"#/$defs/energy/required",keyword:"required",params:{missingProperty: "value"},message:"must have required property '"+"value"+"'",schema:schema78.required,parentSchema:schema78,data:data14};
if(vErrors === null){
vErrors = [err39];
}
else {
vErrors.push(err39);
}
errors++;
}
if(data14.unit === undefined){
const err40 = {instancePath:instancePath+"/weze",schemaPath:"#/$defs/energy/required",keyword:"required",params:{missingProperty: "unit"},message:"must have required property '"+"unit"+"'",schema:schema78.required,parentSchema:schema78,data:data14};
if(vErrors === null){
vErrors = [err40];
}
else {
vErrors.push(err40);
}
errors++;
}
for(const key5 in data14){
if(!((key5 === "value") || (key5 === "unit"))){
const err41 = {instancePath:instancePath+"/weze",schemaPath:"#/$defs/energy/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key5},message:"must NOT have additional properties",schema:false,parentSchema:schema78,data:data14};
if(vErrors === null){
vErrors = [err41];
}
else {
vErrors.push(err41);
}
errors++;
}
}
if(data14.value !== undefined){
let data15 = data14.value;
if(!((typeof data15 == "number") && (isFinite(data15)))){
const err42 = {instancePath:instancePath+"/weze/value",schemaPath:"#/$defs/energy/properties/value/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema78.properties.value.type,parentSchema:schema78.properties.value,data:data15};
if(vErrors === null){
vErrors = [err42];
}
else {
vErrors.push(err42);
}
errors++;
}
}
if(data14.unit !== undefined){
let data16 = data14.unit;
if(!((((((data16 === "cm-1") || (data16 === "eV")) || (data16 === "K")) || (data16 === "J/mol")) || (data16 === "kJ/mol")) || (data16 === "kcal/mol"))){
const err43 = {instancePath:instancePath+"/weze/unit",schemaPath:"#/$defs/energy/properties/unit/enum",keyword:"enum",params:{allowedValues: schema78.properties.unit.enum},message:"must be equal to one of the allowed values",schema:schema78.properties.unit.enum,parentSchema:schema78.properties.unit,data:data16};
if(vErrors === null){
vErrors = [err43];
}
else {
vErrors.push(err43);
}
errors++;
}
}
}
}
if(data.Be !== undefined){
let data17 = data.Be;
if((!((typeof data17 == "number") && (isFinite(data17)))) && (!(data17 && typeof data17 == "object" && !Array.isArray(data17)))){
const err44 = {instancePath:instancePath+"/Be",schemaPath:"#/$defs/rotationalConstant/type",keyword:"type",params:{type: schema38.type},message:"must be number,object",schema:schema38.type,parentSchema:schema38,data:data17};
if(vErrors === null){
vErrors = [err44];
}
else {
vErrors.push(err44);
}
errors++;
}
if((typeof data17 == "number") && (isFinite(data17))){
if(data17 <= 0 || isNaN(data17)){
const err45 = {instancePath:instancePath+"/Be",schemaPath:"#/$defs/rotationalConstant/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema38,data:data17};
if(vErrors === null){
vErrors = [err45];
}
else {
vErrors.push(err45);
}
errors++;
}
}
if(data17 && typeof data17 == "object" && !Array.isArray(data17)){
if(data17.value === undefined){
const err46 = {instancePath:instancePath+"/Be",schemaPath:"#/$defs/rotationalConstant/required",keyword:"required",params:{missingProperty: "value"},message:"must have required property '"+"value"+"'",schema:schema38.required,parentSchema:schema38,data:data17};
if(vErrors === null){
vErrors = [err46];
}
else {
vErrors.push(err46);
}
errors++;
}
if(data17.unit === undefined){
const err47 = {instancePath:instancePath+"/Be",schemaPath:"#/$defs/rotationalConstant/required",keyword:"required",params:{missingProperty: "unit"},message:"must have required property '"+"unit"+"'",schema:schema38.required,parentSchema:schema38,data:data17};
if(vErrors === null){
vErrors = [err47];
}
else {
vErrors.push(err47);
}
errors++;
}
for(const key6 in data17){
if(!((key6 === "value") || (key6 === "unit"))){
const err48 = {instancePath:instancePath+"/Be",schemaPath:"#/$defs/rotationalConstant/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key6},message:"must NOT have additional properties",schema:false,parentSchema:schema38,data:data17};
if(vErrors === null){
vErrors = [err48];
}
else {
vErrors.push(err48);
}
errors++;
}
}
if(data17.value !== undefined){
let data18 = data17.value;
if((typeof data18 == "number") && (isFinite(data18))){
if(data18 <= 0 || isNaN(data18)){
const err49 = {instancePath:instancePath+"/Be/value",schemaPath:"#/$defs/rotationalConstant/properties/value/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema38.properties.value,data:data18};
if(vErrors === null){
vErrors = [err49];
}
else {
vErrors.push(err49);
}
errors++;
}
}
else {
const err50 = {instancePath:instancePath+"/Be/value",schemaPath:"#/$defs/rotationalConstant/properties/value/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema38.properties.value.type,parentSchema:schema38.properties.value,data:data18};
if(vErrors === null){
vErrors = [err50];
}
else {
vErrors.push(err50);
}
errors++;
}
}
if(data17.unit !== undefined){
let data19 = data17.unit;
if(!((((((((data19 === "cm-1") || (data19 === "eV")) || (data19 === "K")) || (data19 === "J/mol")) || (data19 === "kJ/mol")) || (data19 === "kcal/mol")) || (data19 === "MHz")) || (data19 === "GHz"))){
const err51 = {instancePath:instancePath+"/Be/unit",schemaPath:"#/$defs/rotationalConstant/properties/unit/enum",keyword:"enum",params:{allowedValues: schema38.properties.unit.enum},message:"must be equal to one of the allowed values",schema:schema38.properties.unit.enum,parentSchema:schema38.properties.unit,data:data19};
if(vErrors === null){
vErrors = [err51];
}
else {
vErrors.push(err51);
}
errors++;
}
}
}
}
if(data.alphae !== undefined){
let data20 = data.alphae;
if((!((typeof data20 == "number") && (isFinite(data20)))) && (!(data20 && typeof data20 == "object" && !Array.isArray(data20)))){
const err52 = {instancePath:instancePath+"/alphae",schemaPath:"#/$defs/rotationalTerm/type",keyword:"type",params:{type: schema82.type},message:"must be number,object",schema:schema82.type,parentSchema:schema82,data:data20};
if(vErrors === null){
vErrors = [err52];
}
else {
vErrors.push(err52);
}
errors++;
}
if(data20 && typeof data20 == "object" && !Array.isArray(data20)){
if(data20.value === undefined){
const err53 = {instancePath:instancePath+"/alphae",schemaPath:"#/$defs/rotationalTerm/required",keyword:"required",params:{missingProperty: "value"},message:"must have required property '"+"value"+"'",schema:schema82.required,parentSchema:schema82,data:data20};
if(vErrors === null){
vErrors = [err53];
}
else {
vErrors.push(err53);
}
errors++;
}
if(data20.unit === undefined){
const err54 = {instancePath:instancePath+"/alphae",schemaPath:"#/$defs/rotationalTerm/required",keyword:"required",params:{missingProperty: "unit"},message:"must have required property '"+"unit"+"'",schema:schema82.required,parentSchema:schema82,data:data20};
if(vErrors === null){
vErrors = [err54];
}
else {
vErrors.push(err54);
}
errors++;
}
for(const key7 in data20){
if(!((key7 === "value") || (key7 === "unit"))){
const err55 = {instancePath:instancePath+"/alphae",schemaPath:"#/$defs/rotationalTerm/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key7},message:"must NOT have additional properties",schema:false,parentSchema:schema82,data:data20};
if(vErrors === null){
vErrors = [err55];
}
else {
vErrors.push(err55);
}
errors++;
}
}
if(data20.value !== undefined){
let data21 = data20.value;
if(!((typeof data21 == "number") && (isFinite(data21)))){
const err56 = {instancePath:instancePath+"/alphae/value",schemaPath:"#/$defs/rotationalTerm/properties/value/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema82.properties.value.type,parentSchema:schema82.properties.value,data:data21};
if(vErrors === null){
vErrors = [err56];
}
else {
vErrors.push(err56);
}
errors++;
}
}
if(data20.unit !== undefined){
let data22 = data20.unit;
if(!((((((((data22 === "cm-1") || (data22 === "eV")) || (data22 === "K")) || (data22 === "J/mol")) || (data22 === "kJ/mol")) || (data22 === "kcal/mol")) || (data22 === "MHz")) || (data22 === "GHz"))){
const err57 = {instancePath:instancePath+"/alphae/unit",schemaPath:"#/$defs/rotationalTerm/properties/unit/enum",keyword:"enum",params:{allowedValues: schema82.properties.unit.enum},message:"must be equal to one of the allowed values",schema:schema82.properties.unit.enum,parentSchema:schema82.properties.unit,data:data22};
if(vErrors === null){
vErrors = [err57];
}
else {
vErrors.push(err57);
}
errors++;
}
}
}
}
if(data.gammae !== undefined){
let data23 = data.gammae;
if((!((typeof data23 == "number") && (isFinite(data23)))) && (!(data23 && typeof data23 == "object" && !Array.isArray(data23)))){
const err58 = {instancePath:instancePath+"/gammae",schemaPath:"#/$defs/rotationalTerm/type",keyword:"type",params:{type: schema82.type},message:"must be number,object",schema:schema82.type,parentSchema:schema82,data:data23};
if(vErrors === null){
vErrors = [err58];
}
else {
vErrors.push(err58);
}
errors++;
}
if(data23 && typeof data23 == "object" && !Array.isArray(data23)){
if(data23.value === undefined){
const err59 = {instancePath:instancePath+"/gammae",schemaPath:"#/$defs/rotationalTerm/required",keyword:"required",params:{missingProperty: "value"},message:"must have required property '"+"value"+"'",schema:schema82.required,parentSchema:schema82,data:data23};
if(vErrors === null){
vErrors = [err59];
}
else {
vErrors.push(err59);
}
errors++;
}
if(data23.unit === undefined){
const err60 = {instancePath:instancePath+"/gammae",schemaPath:"#/$defs/rotationalTerm/required",keyword:"required",params:{missingProperty: "unit"},message:"must have required property '"+"unit"+"'",schema:schema82.required,parentSchema:schema82,data:data23};
if(vErrors === null){
vErrors = [err60];
}
else {
vErrors.push(err60);
}
errors++;
}
for(const key8 in data23){
if(!((key8 === "value") || (key8 === "unit"))){
const err61 = {instancePath:instancePath+"/gammae",schemaPath:"#/$defs/rotationalTerm/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key8},message:"must NOT have additional properties",schema:false,parentSchema:schema82,data:data23};
if(vErrors === null){
vErrors = [err61];
}
else {
vErrors.push(err61);
}
errors++;
}
}
if(data23.value !== undefined){
let data24 = data23.value;
if(!((typeof data24 == "number") && (isFinite(data24)))){
const err62 = {instancePath:instancePath+"/gammae/value",schemaPath:"#/$defs/rotationalTerm/properties/value/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema82.properties.value.type,parentSchema:schema82.properties.value,data:data24};
if(vErrors === null){
vErrors = [err62];
}
else {
vErrors.push(err62);
}
errors++;
}
}
if(data23.unit !== undefined){
let data25 = data23.unit;
if(!((((((((data25 === "cm-1") || (data25 === "eV")) || (data25 === "K")) || (data25 === "J/mol")) || (data25 === "kJ/mol")) || (data25 === "kcal/mol")) || (data25 === "MHz")) || (data25 === "GHz"))){
const err63 = {instancePath:instancePath+"/gammae/unit",schemaPath:"#/$defs/rotationalTerm/properties/unit/enum",keyword:"enum",params:{allowedValues: schema82.properties.unit.enum},message:"must be equal to one of the allowed values",schema:schema82.properties.unit.enum,parentSchema:schema82.properties.unit,data:data25};
if(vErrors === null){
vErrors = [err63];
}
else {
vErrors.push(err63);
}
errors++;
}
}
}
}
if(data.De !== undefined){
let data26 = data.De;
if((!((typeof data26 == "number") && (isFinite(data26)))) && (!(data26 && typeof data26 == "object" && !Array.isArray(data26)))){
const err64 = {instancePath:instancePath+"/De",schemaPath:"#/$defs/nonNegativeRotationalTerm/type",keyword:"type",params:{type: schema84.type},message:"must be number,object",schema:schema84.type,parentSchema:schema84,data:data26};
if(vErrors === null){
vErrors = [err64];
}
else {
vErrors.push(err64);
}
errors++;
}
if((typeof data26 == "number") && (isFinite(data26))){
if(data26 < 0 || isNaN(data26)){
const err65 = {instancePath:instancePath+"/De",schemaPath:"#/$defs/nonNegativeRotationalTerm/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema84,data:data26};
if(vErrors === null){
vErrors = [err65];
}
else {
vErrors.push(err65);
}
errors++;
}
}
if(data26 && typeof data26 == "object" && !Array.isArray(data26)){
if(data26.value === undefined){
const err66 = {instancePath:instancePath+"/De",schemaPath:"#/$defs/nonNegativeRotationalTerm/required",keyword:"required",params:{missingProperty: "value"},message:"must have required property '"+"value"+"'",schema:schema84.required,parentSchema:schema84,data:data26};
if(vErrors === null){
vErrors = [err66];
}
else {
vErrors.push(err66);
}
errors++;
}
if(data26.unit === undefined){
const err67 = {instancePath:instancePath+"/De",schemaPath:"#/$defs/nonNegativeRotationalTerm/required",keyword:"required",params:{missingProperty: "unit"},message:"must have required property '"+"unit"+"'",schema:schema84.required,parentSchema:schema84,data:data26};
if(vErrors === null){
vErrors = [err67];
}
else {
vErrors.push(err67);
}
errors++;
}
for(const key9 in data26){
if(!((key9 === "value") || (key9 === "unit"))){
const err68 = {instancePath:instancePath+"/De",schemaPath:"#/$defs/nonNegativeRotationalTerm/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key9},message:"must NOT have additional properties",schema:false,parentSchema:schema84,data:data26};
if(vErrors === null){
vErrors = [err68];
}
else {
vErrors.push(err68);
}
errors++;
}
}
if(data26.value !== undefined){
let data27 = data26.value;
if((typeof data27 == "number") && (isFinite(data27))){
if(data27 < 0 || isNaN(data27)){
const err69 = {instancePath:instancePath+"/De/value",schemaPath:"#/$defs/nonNegativeRotationalTerm/properties/value/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema84.properties.value,data:data27};
if(vErrors === null){
vErrors = [err69];
}
else {
vErrors.push(err69);
}
errors++;
}
}
else {
const err70 = {instancePath:instancePath+"/De/value",schemaPath:"#/$defs/nonNegativeRotationalTerm/properties/value/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema84.properties.value.type,parentSchema:schema84.properties.value,data:data27};
if(vErrors === null){
vErrors = [err70];
}
else {
vErrors.push(err70);
}
errors++;
}
}
if(data26.unit !== undefined){
let data28 = data26.unit;
if(!((((((((data28 === "cm-1") || (data28 === "eV")) || (data28 === "K")) || (data28 === "J/mol")) || (data28 === "kJ/mol")) || (data28 === "kcal/mol")) || (data28 === "MHz")) || (data28 === "GHz"))){
const err71 = {instancePath:instancePath+"/De/unit",schemaPath:"#/$defs/nonNegativeRotationalTerm/properties/unit/enum",keyword:"enum",params:{allowedValues: schema84.properties.unit.enum},message:"must be equal to one of the allowed values",schema:schema84.properties.unit.enum,parentSchema:schema84.properties.unit,data:data28};
if(vErrors === null){
vErrors = [err71];
}
else {
vErrors.push(err71);
}
errors++;
}
}
}
}
if(data.betae !== undefined){
let data29 = data.betae;
if((!((typeof data29 == "number") && (isFinite(data29)))) && (!(data29 && typeof data29 == "object" && !Array.isArray(data29)))){
const err72 = {instancePath:instancePath+"/betae",schemaPath:"#/$defs/rotationalTerm/type",keyword:"type",params:{type: schema82.type},message:"must be number,object",schema:schema82.type,parentSchema:schema82,data:data29};
if(vErrors === null){
vErrors = [err72];
}
else {
vErrors.push(err72);
}
errors++;
}
if(data29 && typeof data29 == "object" && !Array.isArray(data29)){
if(data29.value === undefined){
const err73 = {instancePath:instancePath+"/betae",schemaPath:"#/$defs/rotationalTerm/required",keyword:"required",params:{missingProperty: "value"},message:"must have required property '"+"value"+"'",schema:schema82.required,parentSchema:schema82,data:data29};
if(vErrors === null){
vErrors = [err73];
}
else {
vErrors.push(err73);
}
errors++;
}
if(data29.unit === undefined){
const err74 = {instancePath:instancePath+"/betae",schemaPath:"#/$defs/rotationalTerm/required",keyword:"required",params:{missingProperty: "unit"},message:"must have required property '"+"unit"+"'",schema:schema82.required,parentSchema:schema82,data:data29};
if(vErrors === null){
vErrors = [err74];
}
else {
vErrors.push(err74);
}
errors++;
}
for(const key10 in data29){
if(!((key10 === "value") || (key10 === "unit"))){
const err75 = {instancePath:instancePath+"/betae",schemaPath:"#/$defs/rotationalTerm/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key10},message:"must NOT have additional properties",schema:false,parentSchema:schema82,data:data29};
if(vErrors === null){
vErrors = [err75];
}
else {
vErrors.push(err75);
}
errors++;
}
}
if(data29.value !== undefined){
let data30 = data29.value;
if(!((typeof data30 == "number") && (isFinite(data30)))){
const err76 = {instancePath:instancePath+"/betae/value",schemaPath:"#/$defs/rotationalTerm/properties/value/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema82.properties.value.type,parentSchema:schema82.properties.value,data:data30};
if(vErrors === null){
vErrors = [err76];
}
else {
vErrors.push(err76);
}
errors++;
}
}
if(data29.unit !== undefined){
let data31 = data29.unit;
if(!((((((((data31 === "cm-1") || (data31 === "eV")) || (data31 === "K")) || (data31 === "J/mol")) || (data31 === "kJ/mol")) || (data31 === "kcal/mol")) || (data31 === "MHz")) || (data31 === "GHz"))){
const err77 = {instancePath:instancePath+"/betae/unit",schemaPath:"#/$defs/rotationalTerm/properties/unit/enum",keyword:"enum",params:{allowedValues: schema82.properties.unit.enum},message:"must be equal to one of the allowed values",schema:schema82.properties.unit.enum,parentSchema:schema82.properties.unit,data:data31};
if(vErrors === null){
vErrors = [err77];
}
else {
vErrors.push(err77);
}
errors++;
}
}
}
}
if(data.He !== undefined){
let data32 = data.He;
if((!((typeof data32 == "number") && (isFinite(data32)))) && (!(data32 && typeof data32 == "object" && !Array.isArray(data32)))){
const err78 = {instancePath:instancePath+"/He",schemaPath:"#/$defs/rotationalTerm/type",keyword:"type",params:{type: schema82.type},message:"must be number,object",schema:schema82.type,parentSchema:schema82,data:data32};
if(vErrors === null){
vErrors = [err78];
}
else {
vErrors.push(err78);
}
errors++;
}
if(data32 && typeof data32 == "object" && !Array.isArray(data32)){
if(data32.value === undefined){
const err79 = {instancePath:instancePath+"/He",schemaPath:"#/$defs/rotationalTerm/required",keyword:"required",params:{missingProperty: "value"},message:"must have required property '"+"value"+"'",schema:schema82.required,parentSchema:schema82,data:data32};
if(vErrors === null){
vErrors = [err79];
}
else {
vErrors.push(err79);
}
errors++;
}
if(data32.unit === undefined){
const err80 = {instancePath:instancePath+"/He",schemaPath:"#/$defs/rotationalTerm/required",keyword:"required",params:{missingProperty: "unit"},message:"must have required property '"+"unit"+"'",schema:schema82.required,parentSchema:schema82,data:data32};
if(vErrors === null){
vErrors = [err80];
}
else {
vErrors.push(err80);
}
errors++;
}
for(const key11 in data32){
if(!((key11 === "value") || (key11 === "unit"))){
const err81 = {instancePath:instancePath+"/He",schemaPath:"#/$defs/rotationalTerm/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key11},message:"must NOT have additional properties",schema:false,parentSchema:schema82,data:data32};
if(vErrors === null){
vErrors = [err81];
}
else {
vErrors.push(err81);
}
errors++;
}
}
if(data32.value !== undefined){
let data33 = data32.value;
if(!((typeof data33 == "number") && (isFinite(data33)))){
const err82 = {instancePath:instancePath+"/He/value",schemaPath:"#/$defs/rotationalTerm/properties/value/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema82.properties.value.type,parentSchema:schema82.properties.value,data:data33};
if(vErrors === null){
vErrors = [err82];
}
else {
vErrors.push(err82);
}
errors++;
}
}
if(data32.unit !== undefined){
let data34 = data32.unit;
if(!((((((((data34 === "cm-1") || (data34 === "eV")) || (data34 === "K")) || (data34 === "J/mol")) || (data34 === "kJ/mol")) || (data34 === "kcal/mol")) || (data34 === "MHz")) || (data34 === "GHz"))){
const err83 = {instancePath:instancePath+"/He/unit",schemaPath:"#/$defs/rotationalTerm/properties/unit/enum",keyword:"enum",params:{allowedValues: schema82.properties.unit.enum},message:"must be equal to one of the allowed values",schema:schema82.properties.unit.enum,parentSchema:schema82.properties.unit,data:data34};
if(vErrors === null){
vErrors = [err83];
}
else {
vErrors.push(err83);
}
errors++;
}
}
}
}
if(data.dissociation_energy !== undefined){
let data35 = data.dissociation_energy;
if((!((typeof data35 == "number") && (isFinite(data35)))) && (!(data35 && typeof data35 == "object" && !Array.isArray(data35)))){
const err84 = {instancePath:instancePath+"/dissociation_energy",schemaPath:"#/$defs/positiveEnergy/type",keyword:"type",params:{type: schema72.type},message:"must be number,object",schema:schema72.type,parentSchema:schema72,data:data35};
if(vErrors === null){
vErrors = [err84];
}
else {
vErrors.push(err84);
}
errors++;
}
if((typeof data35 == "number") && (isFinite(data35))){
if(data35 <= 0 || isNaN(data35)){
const err85 = {instancePath:instancePath+"/dissociation_energy",schemaPath:"#/$defs/positiveEnergy/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema72,data:data35};
if(vErrors === null){
vErrors = [err85];
}
else {
vErrors.push(err85);
}
errors++;
}
}
if(data35 && typeof data35 == "object" && !Array.isArray(data35)){
if(data35.value === undefined){
const err86 = {instancePath:instancePath+"/dissociation_energy",schemaPath:"#/$defs/positiveEnergy/required",keyword:"required",params:{missingProperty: "value"},message:"must have required property '"+"value"+"'",schema:schema72.required,parentSchema:schema72,data:data35};
if(vErrors === null){
vErrors = [err86];
}
else {
vErrors.push(err86);
}
errors++;
}
if(data35.unit === undefined){
const err87 = {instancePath:instancePath+"/dissociation_energy",schemaPath:"#/$defs/positiveEnergy/required",keyword:"required",params:{missingProperty: "unit"},message:"must have required property '"+"unit"+"'",schema:schema72.required,parentSchema:schema72,data:data35};
if(vErrors === null){
vErrors = [err87];
}
else {
vErrors.push(err87);
}
errors++;
}
for(const key12 in data35){
if(!((key12 === "value") || (key12 === "unit"))){
const err88 = {instancePath:instancePath+"/dissociation_energy",schemaPath:"#/$defs/positiveEnergy/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key12},message:"must NOT have additional properties",schema:false,parentSchema:schema72,data:data35};
if(vErrors === null){
vErrors = [err88];
}
else {
vErrors.push(err88);
}
errors++;
}
}
if(data35.value !== undefined){
let data36 = data35.value;
if((typeof data36 == "number") && (isFinite(data36))){
if(data36 <= 0 || isNaN(data36)){
const err89 = {instancePath:instancePath+"/dissociation_energy/value",schemaPath:"#/$defs/positiveEnergy/properties/value/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema72.properties.value,data:data36};
if(vErrors === null){
vErrors = [err89];
}
else {
vErrors.push(err89);
}
errors++;
}
}
else {
const err90 = {instancePath:instancePath+"/dissociation_energy/value",schemaPath:"#/$defs/positiveEnergy/properties/value/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema72.properties.value.type,parentSchema:schema72.properties.value,data:data36};
if(vErrors === null){
vErrors = [err90];
}
else {
vErrors.push(err90);
}
errors++;
}
}
if(data35.unit !== undefined){
let data37 = data35.unit;
if(!((((((data37 === "cm-1") || (data37 === "eV")) || (data37 === "K")) || (data37 === "J/mol")) || (data37 === "kJ/mol")) || (data37 === "kcal/mol"))){
const err91 = {instancePath:instancePath+"/dissociation_energy/unit",schemaPath:"#/$defs/positiveEnergy/properties/unit/enum",keyword:"enum",params:{allowedValues: schema72.properties.unit.enum},message:"must be equal to one of the allowed values",schema:schema72.properties.unit.enum,parentSchema:schema72.properties.unit,data:data37};
if(vErrors === null){
vErrors = [err91];
}
else {
vErrors.push(err91);
}
errors++;
}
}
}
}
}
else {
const err92 = {instancePath,schemaPath:"#/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema74.type,parentSchema:schema74,data};
if(vErrors === null){
vErrors = [err92];
}
else {
vErrors.push(err92);
}
errors++;
}
validate40.errors = vErrors;
return errors === 0;
}
validate40.evaluated = {"props":true,"dynamicProps":false,"dynamicItems":false};


function validate20(data, {instancePath="", parentData, parentDataProperty, rootData=data, dynamicAnchors={}}={}){
/*# sourceURL="https://qforge.invalid/schemas/species.schema.json" */;
let vErrors = null;
let errors = 0;
const evaluated0 = validate20.evaluated;
if(evaluated0.dynamicProps){
evaluated0.props = undefined;
}
if(evaluated0.dynamicItems){
evaluated0.items = undefined;
}
const _errs2 = errors;
let valid1 = true;
const _errs3 = errors;
if(data && typeof data == "object" && !Array.isArray(data)){
let missing0;
if((data.structure === undefined) && (missing0 = "structure")){
const err0 = {};
if(vErrors === null){
vErrors = [err0];
}
else {
vErrors.push(err0);
}
errors++;
}
else {
if(data.structure !== undefined){
if("atom" !== data.structure){
const err1 = {};
if(vErrors === null){
vErrors = [err1];
}
else {
vErrors.push(err1);
}
errors++;
}
}
}
}
var _valid0 = _errs3 === errors;
errors = _errs2;
if(vErrors !== null){
if(_errs2){
vErrors.length = _errs2;
}
else {
vErrors = null;
}
}
if(_valid0){
const _errs5 = errors;
if(data && typeof data == "object" && !Array.isArray(data)){
if(data.symmetry_number !== undefined){
const err2 = {instancePath:instancePath+"/symmetry_number",schemaPath:"#/allOf/0/then/properties/symmetry_number/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[0].then.properties.symmetry_number,data:data.symmetry_number};
if(vErrors === null){
vErrors = [err2];
}
else {
vErrors.push(err2);
}
errors++;
}
if(data.rotational_constants !== undefined){
const err3 = {instancePath:instancePath+"/rotational_constants",schemaPath:"#/allOf/0/then/properties/rotational_constants/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[0].then.properties.rotational_constants,data:data.rotational_constants};
if(vErrors === null){
vErrors = [err3];
}
else {
vErrors.push(err3);
}
errors++;
}
if(data.moments_of_inertia !== undefined){
const err4 = {instancePath:instancePath+"/moments_of_inertia",schemaPath:"#/allOf/0/then/properties/moments_of_inertia/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[0].then.properties.moments_of_inertia,data:data.moments_of_inertia};
if(vErrors === null){
vErrors = [err4];
}
else {
vErrors.push(err4);
}
errors++;
}
if(data.vibrations !== undefined){
const err5 = {instancePath:instancePath+"/vibrations",schemaPath:"#/allOf/0/then/properties/vibrations/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[0].then.properties.vibrations,data:data.vibrations};
if(vErrors === null){
vErrors = [err5];
}
else {
vErrors.push(err5);
}
errors++;
}
if(data.dissociation_energy !== undefined){
const err6 = {instancePath:instancePath+"/dissociation_energy",schemaPath:"#/allOf/0/then/properties/dissociation_energy/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[0].then.properties.dissociation_energy,data:data.dissociation_energy};
if(vErrors === null){
vErrors = [err6];
}
else {
vErrors.push(err6);
}
errors++;
}
if(data.nuclear_spin_weights !== undefined){
const err7 = {instancePath:instancePath+"/nuclear_spin_weights",schemaPath:"#/allOf/0/then/properties/nuclear_spin_weights/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[0].then.properties.nuclear_spin_weights,data:data.nuclear_spin_weights};
if(vErrors === null){
vErrors = [err7];
}
else {
vErrors.push(err7);
}
errors++;
}
if(data.nuclear_spin_mixture !== undefined){
const err8 = {instancePath:instancePath+"/nuclear_spin_mixture",schemaPath:"#/allOf/0/then/properties/nuclear_spin_mixture/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[0].then.properties.nuclear_spin_mixture,data:data.nuclear_spin_mixture};
if(vErrors === null){
vErrors = [err8];
}
else {
vErrors.push(err8);
}
errors++;
}
if(data.electronic_states !== undefined){
const err9 = {instancePath:instancePath+"/electronic_states",schemaPath:"#/allOf/0/then/properties/electronic_states/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[0].then.properties.electronic_states,data:data.electronic_states};
if(vErrors === null){
vErrors = [err9];
}
else {
vErrors.push(err9);
}
errors++;
}
if(data.internal_rotors !== undefined){
const err10 = {instancePath:instancePath+"/internal_rotors",schemaPath:"#/allOf/0/then/properties/internal_rotors/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[0].then.properties.internal_rotors,data:data.internal_rotors};
if(vErrors === null){
vErrors = [err10];
}
else {
vErrors.push(err10);
}
errors++;
}
if(data.vibration_scale_factor !== undefined){
const err11 = {instancePath:instancePath+"/vibration_scale_factor",schemaPath:"#/allOf/0/then/properties/vibration_scale_factor/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[0].then.properties.vibration_scale_factor,data:data.vibration_scale_factor};
if(vErrors === null){
vErrors = [err11];
}
else {
vErrors.push(err11);
}
errors++;
}
if(data.anharmonicity !== undefined){
const err12 = {instancePath:instancePath+"/anharmonicity",schemaPath:"#/allOf/0/then/properties/anharmonicity/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[0].then.properties.anharmonicity,data:data.anharmonicity};
if(vErrors === null){
vErrors = [err12];
}
else {
vErrors.push(err12);
}
errors++;
}
if(data.centrifugal_distortion !== undefined){
const err13 = {instancePath:instancePath+"/centrifugal_distortion",schemaPath:"#/allOf/0/then/properties/centrifugal_distortion/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[0].then.properties.centrifugal_distortion,data:data.centrifugal_distortion};
if(vErrors === null){
vErrors = [err13];
}
else {
vErrors.push(err13);
}
errors++;
}
if(data.conformers !== undefined){
const err14 = {instancePath:instancePath+"/conformers",schemaPath:"#/allOf/0/then/properties/conformers/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[0].then.properties.conformers,data:data.conformers};
if(vErrors === null){
vErrors = [err14];
}
else {
vErrors.push(err14);
}
errors++;
}
if(data.geometry !== undefined){
const err15 = {instancePath:instancePath+"/geometry",schemaPath:"#/allOf/0/then/properties/geometry/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[0].then.properties.geometry,data:data.geometry};
if(vErrors === null){
vErrors = [err15];
}
else {
vErrors.push(err15);
}
errors++;
}
if(data.geometry_file !== undefined){
const err16 = {instancePath:instancePath+"/geometry_file",schemaPath:"#/allOf/0/then/properties/geometry_file/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[0].then.properties.geometry_file,data:data.geometry_file};
if(vErrors === null){
vErrors = [err16];
}
else {
vErrors.push(err16);
}
errors++;
}
if(data.optical_isomers !== undefined){
const err17 = {instancePath:instancePath+"/optical_isomers",schemaPath:"#/allOf/0/then/properties/optical_isomers/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[0].then.properties.optical_isomers,data:data.optical_isomers};
if(vErrors === null){
vErrors = [err17];
}
else {
vErrors.push(err17);
}
errors++;
}
}
var _valid0 = _errs5 === errors;
valid1 = _valid0;
if(valid1){
var props0 = {};
props0.symmetry_number = true;
props0.rotational_constants = true;
props0.moments_of_inertia = true;
props0.vibrations = true;
props0.dissociation_energy = true;
props0.nuclear_spin_weights = true;
props0.nuclear_spin_mixture = true;
props0.electronic_states = true;
props0.internal_rotors = true;
props0.vibration_scale_factor = true;
props0.anharmonicity = true;
props0.centrifugal_distortion = true;
props0.conformers = true;
props0.geometry = true;
props0.geometry_file = true;
props0.optical_isomers = true;
props0.structure = true;
}
}
if(!valid1){
const err18 = {instancePath,schemaPath:"#/allOf/0/if",keyword:"if",params:{failingKeyword: "then"},message:"must match \"then\" schema",schema:schema31.allOf[0].if,parentSchema:schema31.allOf[0],data};
if(vErrors === null){
vErrors = [err18];
}
else {
vErrors.push(err18);
}
errors++;
}
const _errs7 = errors;
let valid4 = true;
const _errs8 = errors;
if(data && typeof data == "object" && !Array.isArray(data)){
let missing1;
if((data.structure === undefined) && (missing1 = "structure")){
const err19 = {};
if(vErrors === null){
vErrors = [err19];
}
else {
vErrors.push(err19);
}
errors++;
}
else {
if(data.structure !== undefined){
if("diatomic" !== data.structure){
const err20 = {};
if(vErrors === null){
vErrors = [err20];
}
else {
vErrors.push(err20);
}
errors++;
}
}
}
}
var _valid1 = _errs8 === errors;
errors = _errs7;
if(vErrors !== null){
if(_errs7){
vErrors.length = _errs7;
}
else {
vErrors = null;
}
}
if(_valid1){
const _errs10 = errors;
if(data && typeof data == "object" && !Array.isArray(data)){
if(data.symmetry_number === undefined){
const err21 = {instancePath,schemaPath:"#/allOf/1/then/required",keyword:"required",params:{missingProperty: "symmetry_number"},message:"must have required property '"+"symmetry_number"+"'",schema:schema31.allOf[1].then.required,parentSchema:schema31.allOf[1].then,data};
if(vErrors === null){
vErrors = [err21];
}
else {
vErrors.push(err21);
}
errors++;
}
if(data.dissociation_energy === undefined){
const err22 = {instancePath,schemaPath:"#/allOf/1/then/required",keyword:"required",params:{missingProperty: "dissociation_energy"},message:"must have required property '"+"dissociation_energy"+"'",schema:schema31.allOf[1].then.required,parentSchema:schema31.allOf[1].then,data};
if(vErrors === null){
vErrors = [err22];
}
else {
vErrors.push(err22);
}
errors++;
}
if(data.electronic_states === undefined){
const err23 = {instancePath,schemaPath:"#/allOf/1/then/required",keyword:"required",params:{missingProperty: "electronic_states"},message:"must have required property '"+"electronic_states"+"'",schema:schema31.allOf[1].then.required,parentSchema:schema31.allOf[1].then,data};
if(vErrors === null){
vErrors = [err23];
}
else {
vErrors.push(err23);
}
errors++;
}
if(data.electronic_levels !== undefined){
const err24 = {instancePath:instancePath+"/electronic_levels",schemaPath:"#/allOf/1/then/properties/electronic_levels/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[1].then.properties.electronic_levels,data:data.electronic_levels};
if(vErrors === null){
vErrors = [err24];
}
else {
vErrors.push(err24);
}
errors++;
}
if(data.rotational_constants !== undefined){
const err25 = {instancePath:instancePath+"/rotational_constants",schemaPath:"#/allOf/1/then/properties/rotational_constants/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[1].then.properties.rotational_constants,data:data.rotational_constants};
if(vErrors === null){
vErrors = [err25];
}
else {
vErrors.push(err25);
}
errors++;
}
if(data.moments_of_inertia !== undefined){
const err26 = {instancePath:instancePath+"/moments_of_inertia",schemaPath:"#/allOf/1/then/properties/moments_of_inertia/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[1].then.properties.moments_of_inertia,data:data.moments_of_inertia};
if(vErrors === null){
vErrors = [err26];
}
else {
vErrors.push(err26);
}
errors++;
}
if(data.vibrations !== undefined){
const err27 = {instancePath:instancePath+"/vibrations",schemaPath:"#/allOf/1/then/properties/vibrations/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[1].then.properties.vibrations,data:data.vibrations};
if(vErrors === null){
vErrors = [err27];
}
else {
vErrors.push(err27);
}
errors++;
}
if(data.internal_rotors !== undefined){
const err28 = {instancePath:instancePath+"/internal_rotors",schemaPath:"#/allOf/1/then/properties/internal_rotors/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[1].then.properties.internal_rotors,data:data.internal_rotors};
if(vErrors === null){
vErrors = [err28];
}
else {
vErrors.push(err28);
}
errors++;
}
if(data.vibration_scale_factor !== undefined){
const err29 = {instancePath:instancePath+"/vibration_scale_factor",schemaPath:"#/allOf/1/then/properties/vibration_scale_factor/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[1].then.properties.vibration_scale_factor,data:data.vibration_scale_factor};
if(vErrors === null){
vErrors = [err29];
}
else {
vErrors.push(err29);
}
errors++;
}
if(data.anharmonicity !== undefined){
const err30 = {instancePath:instancePath+"/anharmonicity",schemaPath:"#/allOf/1/then/properties/anharmonicity/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[1].then.properties.anharmonicity,data:data.anharmonicity};
if(vErrors === null){
vErrors = [err30];
}
else {
vErrors.push(err30);
}
errors++;
}
if(data.centrifugal_distortion !== undefined){
const err31 = {instancePath:instancePath+"/centrifugal_distortion",schemaPath:"#/allOf/1/then/properties/centrifugal_distortion/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[1].then.properties.centrifugal_distortion,data:data.centrifugal_distortion};
if(vErrors === null){
vErrors = [err31];
}
else {
vErrors.push(err31);
}
errors++;
}
if(data.conformers !== undefined){
const err32 = {instancePath:instancePath+"/conformers",schemaPath:"#/allOf/1/then/properties/conformers/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[1].then.properties.conformers,data:data.conformers};
if(vErrors === null){
vErrors = [err32];
}
else {
vErrors.push(err32);
}
errors++;
}
if(data.geometry !== undefined){
const err33 = {instancePath:instancePath+"/geometry",schemaPath:"#/allOf/1/then/properties/geometry/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[1].then.properties.geometry,data:data.geometry};
if(vErrors === null){
vErrors = [err33];
}
else {
vErrors.push(err33);
}
errors++;
}
if(data.geometry_file !== undefined){
const err34 = {instancePath:instancePath+"/geometry_file",schemaPath:"#/allOf/1/then/properties/geometry_file/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[1].then.properties.geometry_file,data:data.geometry_file};
if(vErrors === null){
vErrors = [err34];
}
else {
vErrors.push(err34);
}
errors++;
}
if(data.optical_isomers !== undefined){
const err35 = {instancePath:instancePath+"/optical_isomers",schemaPath:"#/allOf/1/then/properties/optical_isomers/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[1].then.properties.optical_isomers,data:data.optical_isomers};
if(vErrors === null){
vErrors = [err35];
}
else {
vErrors.push(err35);
}
errors++;
}
}
var _valid1 = _errs10 === errors;
valid4 = _valid1;
if(valid4){
var props1 = {};
props1.electronic_levels = true;
props1.rotational_constants = true;
props1.moments_of_inertia = true;
props1.vibrations = true;
props1.internal_rotors = true;
props1.vibration_scale_factor = true;
props1.anharmonicity = true;
props1.centrifugal_distortion = true;
props1.conformers = true;
props1.geometry = true;
props1.geometry_file = true;
props1.optical_isomers = true;
props1.structure = true;
}
}
if(!valid4){
const err36 = {instancePath,schemaPath:"#/allOf/1/if",keyword:"if",params:{failingKeyword: "then"},message:"must match \"then\" schema",schema:schema31.allOf[1].if,parentSchema:schema31.allOf[1],data};
if(vErrors === null){
vErrors = [err36];
}
else {
vErrors.push(err36);
}
errors++;
}
if(props0 !== true && props1 !== undefined){
if(props1 === true){
props0 = true;
}
else {
props0 = props0 || {};
Object.assign(props0, props1);
}
}
const _errs12 = errors;
let valid7 = true;
const _errs13 = errors;
if(data && typeof data == "object" && !Array.isArray(data)){
let missing2;
if((data.structure === undefined) && (missing2 = "structure")){
const err37 = {};
if(vErrors === null){
vErrors = [err37];
}
else {
vErrors.push(err37);
}
errors++;
}
else {
if(data.structure !== undefined){
if("linear" !== data.structure){
const err38 = {};
if(vErrors === null){
vErrors = [err38];
}
else {
vErrors.push(err38);
}
errors++;
}
}
}
}
var _valid2 = _errs13 === errors;
errors = _errs12;
if(vErrors !== null){
if(_errs12){
vErrors.length = _errs12;
}
else {
vErrors = null;
}
}
if(_valid2){
const _errs15 = errors;
const _errs16 = errors;
let valid9 = true;
const _errs17 = errors;
if(data && typeof data == "object" && !Array.isArray(data)){
let missing3;
if((data.conformers === undefined) && (missing3 = "conformers")){
const err39 = {};
if(vErrors === null){
vErrors = [err39];
}
else {
vErrors.push(err39);
}
errors++;
}
}
var _valid3 = _errs17 === errors;
errors = _errs16;
if(vErrors !== null){
if(_errs16){
vErrors.length = _errs16;
}
else {
vErrors = null;
}
}
let ifClause0;
if(_valid3){
const _errs18 = errors;
if(data && typeof data == "object" && !Array.isArray(data)){
if(data.symmetry_number !== undefined){
const err40 = {instancePath:instancePath+"/symmetry_number",schemaPath:"#/allOf/2/then/then/properties/symmetry_number/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[2].then.then.properties.symmetry_number,data:data.symmetry_number};
if(vErrors === null){
vErrors = [err40];
}
else {
vErrors.push(err40);
}
errors++;
}
if(data.rotational_constants !== undefined){
const err41 = {instancePath:instancePath+"/rotational_constants",schemaPath:"#/allOf/2/then/then/properties/rotational_constants/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[2].then.then.properties.rotational_constants,data:data.rotational_constants};
if(vErrors === null){
vErrors = [err41];
}
else {
vErrors.push(err41);
}
errors++;
}
if(data.moments_of_inertia !== undefined){
const err42 = {instancePath:instancePath+"/moments_of_inertia",schemaPath:"#/allOf/2/then/then/properties/moments_of_inertia/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[2].then.then.properties.moments_of_inertia,data:data.moments_of_inertia};
if(vErrors === null){
vErrors = [err42];
}
else {
vErrors.push(err42);
}
errors++;
}
if(data.vibrations !== undefined){
const err43 = {instancePath:instancePath+"/vibrations",schemaPath:"#/allOf/2/then/then/properties/vibrations/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[2].then.then.properties.vibrations,data:data.vibrations};
if(vErrors === null){
vErrors = [err43];
}
else {
vErrors.push(err43);
}
errors++;
}
if(data.internal_rotors !== undefined){
const err44 = {instancePath:instancePath+"/internal_rotors",schemaPath:"#/allOf/2/then/then/properties/internal_rotors/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[2].then.then.properties.internal_rotors,data:data.internal_rotors};
if(vErrors === null){
vErrors = [err44];
}
else {
vErrors.push(err44);
}
errors++;
}
if(data.electronic_levels !== undefined){
const err45 = {instancePath:instancePath+"/electronic_levels",schemaPath:"#/allOf/2/then/then/properties/electronic_levels/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[2].then.then.properties.electronic_levels,data:data.electronic_levels};
if(vErrors === null){
vErrors = [err45];
}
else {
vErrors.push(err45);
}
errors++;
}
if(data.vibration_scale_factor !== undefined){
const err46 = {instancePath:instancePath+"/vibration_scale_factor",schemaPath:"#/allOf/2/then/then/properties/vibration_scale_factor/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[2].then.then.properties.vibration_scale_factor,data:data.vibration_scale_factor};
if(vErrors === null){
vErrors = [err46];
}
else {
vErrors.push(err46);
}
errors++;
}
if(data.anharmonicity !== undefined){
const err47 = {instancePath:instancePath+"/anharmonicity",schemaPath:"#/allOf/2/then/then/properties/anharmonicity/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[2].then.then.properties.anharmonicity,data:data.anharmonicity};
if(vErrors === null){
vErrors = [err47];
}
else {
vErrors.push(err47);
}
errors++;
}
if(data.centrifugal_distortion !== undefined){
const err48 = {instancePath:instancePath+"/centrifugal_distortion",schemaPath:"#/allOf/2/then/then/properties/centrifugal_distortion/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[2].then.then.properties.centrifugal_distortion,data:data.centrifugal_distortion};
if(vErrors === null){
vErrors = [err48];
}
else {
vErrors.push(err48);
}
errors++;
}
if(data.dissociation_energy !== undefined){
const err49 = {instancePath:instancePath+"/dissociation_energy",schemaPath:"#/allOf/2/then/then/properties/dissociation_energy/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[2].then.then.properties.dissociation_energy,data:data.dissociation_energy};
if(vErrors === null){
vErrors = [err49];
}
else {
vErrors.push(err49);
}
errors++;
}
if(data.geometry !== undefined){
const err50 = {instancePath:instancePath+"/geometry",schemaPath:"#/allOf/2/then/then/properties/geometry/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[2].then.then.properties.geometry,data:data.geometry};
if(vErrors === null){
vErrors = [err50];
}
else {
vErrors.push(err50);
}
errors++;
}
if(data.geometry_file !== undefined){
const err51 = {instancePath:instancePath+"/geometry_file",schemaPath:"#/allOf/2/then/then/properties/geometry_file/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[2].then.then.properties.geometry_file,data:data.geometry_file};
if(vErrors === null){
vErrors = [err51];
}
else {
vErrors.push(err51);
}
errors++;
}
}
var _valid3 = _errs18 === errors;
valid9 = _valid3;
if(valid9){
var props2 = {};
props2.symmetry_number = true;
props2.rotational_constants = true;
props2.moments_of_inertia = true;
props2.vibrations = true;
props2.internal_rotors = true;
props2.electronic_levels = true;
props2.vibration_scale_factor = true;
props2.anharmonicity = true;
props2.centrifugal_distortion = true;
props2.dissociation_energy = true;
props2.geometry = true;
props2.geometry_file = true;
}
ifClause0 = "then";
}
else {
const _errs19 = errors;
if(data && typeof data == "object" && !Array.isArray(data)){
if(data.vibrations === undefined){
const err52 = {instancePath,schemaPath:"#/allOf/2/then/else/required",keyword:"required",params:{missingProperty: "vibrations"},message:"must have required property '"+"vibrations"+"'",schema:schema31.allOf[2].then.else.required,parentSchema:schema31.allOf[2].then.else,data};
if(vErrors === null){
vErrors = [err52];
}
else {
vErrors.push(err52);
}
errors++;
}
}
var _valid3 = _errs19 === errors;
valid9 = _valid3;
ifClause0 = "else";
}
if(!valid9){
const err53 = {instancePath,schemaPath:"#/allOf/2/then/if",keyword:"if",params:{failingKeyword: ifClause0},message:"must match \""+ifClause0+"\" schema",schema:schema31.allOf[2].then.if,parentSchema:schema31.allOf[2].then,data};
if(vErrors === null){
vErrors = [err53];
}
else {
vErrors.push(err53);
}
errors++;
}
if(data && typeof data == "object" && !Array.isArray(data)){
if(props2 !== true){
props2 = props2 || {};
props2.nuclear_spin_weights = true;
props2.nuclear_spin_mixture = true;
props2.electronic_states = true;
}
if(data.nuclear_spin_weights !== undefined){
const err54 = {instancePath:instancePath+"/nuclear_spin_weights",schemaPath:"#/allOf/2/then/properties/nuclear_spin_weights/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[2].then.properties.nuclear_spin_weights,data:data.nuclear_spin_weights};
if(vErrors === null){
vErrors = [err54];
}
else {
vErrors.push(err54);
}
errors++;
}
if(data.nuclear_spin_mixture !== undefined){
const err55 = {instancePath:instancePath+"/nuclear_spin_mixture",schemaPath:"#/allOf/2/then/properties/nuclear_spin_mixture/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[2].then.properties.nuclear_spin_mixture,data:data.nuclear_spin_mixture};
if(vErrors === null){
vErrors = [err55];
}
else {
vErrors.push(err55);
}
errors++;
}
if(data.electronic_states !== undefined){
const err56 = {instancePath:instancePath+"/electronic_states",schemaPath:"#/allOf/2/then/properties/electronic_states/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[2].then.properties.electronic_states,data:data.electronic_states};
if(vErrors === null){
vErrors = [err56];
}
else {
vErrors.push(err56);
}
errors++;
}
}
var _valid2 = _errs15 === errors;
valid7 = _valid2;
if(valid7){
if(props2 !== true){
props2 = props2 || {};
props2.structure = true;
}
}
}
if(!valid7){
const err57 = {instancePath,schemaPath:"#/allOf/2/if",keyword:"if",params:{failingKeyword: "then"},message:"must match \"then\" schema",schema:schema31.allOf[2].if,parentSchema:schema31.allOf[2],data};
if(vErrors === null){
vErrors = [err57];
}
else {
vErrors.push(err57);
}
errors++;
}
if(props0 !== true && props2 !== undefined){
if(props2 === true){
props0 = true;
}
else {
props0 = props0 || {};
Object.assign(props0, props2);
}
}
const _errs21 = errors;
let valid12 = true;
const _errs22 = errors;
if(data && typeof data == "object" && !Array.isArray(data)){
let missing4;
if((data.structure === undefined) && (missing4 = "structure")){
const err58 = {};
if(vErrors === null){
vErrors = [err58];
}
else {
vErrors.push(err58);
}
errors++;
}
else {
if(data.structure !== undefined){
if("nonlinear" !== data.structure){
const err59 = {};
if(vErrors === null){
vErrors = [err59];
}
else {
vErrors.push(err59);
}
errors++;
}
}
}
}
var _valid4 = _errs22 === errors;
errors = _errs21;
if(vErrors !== null){
if(_errs21){
vErrors.length = _errs21;
}
else {
vErrors = null;
}
}
if(_valid4){
const _errs24 = errors;
const _errs25 = errors;
let valid14 = true;
const _errs26 = errors;
if(data && typeof data == "object" && !Array.isArray(data)){
let missing5;
if((data.conformers === undefined) && (missing5 = "conformers")){
const err60 = {};
if(vErrors === null){
vErrors = [err60];
}
else {
vErrors.push(err60);
}
errors++;
}
}
var _valid5 = _errs26 === errors;
errors = _errs25;
if(vErrors !== null){
if(_errs25){
vErrors.length = _errs25;
}
else {
vErrors = null;
}
}
let ifClause1;
if(_valid5){
const _errs27 = errors;
if(data && typeof data == "object" && !Array.isArray(data)){
if(data.symmetry_number !== undefined){
const err61 = {instancePath:instancePath+"/symmetry_number",schemaPath:"#/allOf/3/then/then/properties/symmetry_number/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[3].then.then.properties.symmetry_number,data:data.symmetry_number};
if(vErrors === null){
vErrors = [err61];
}
else {
vErrors.push(err61);
}
errors++;
}
if(data.rotational_constants !== undefined){
const err62 = {instancePath:instancePath+"/rotational_constants",schemaPath:"#/allOf/3/then/then/properties/rotational_constants/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[3].then.then.properties.rotational_constants,data:data.rotational_constants};
if(vErrors === null){
vErrors = [err62];
}
else {
vErrors.push(err62);
}
errors++;
}
if(data.moments_of_inertia !== undefined){
const err63 = {instancePath:instancePath+"/moments_of_inertia",schemaPath:"#/allOf/3/then/then/properties/moments_of_inertia/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[3].then.then.properties.moments_of_inertia,data:data.moments_of_inertia};
if(vErrors === null){
vErrors = [err63];
}
else {
vErrors.push(err63);
}
errors++;
}
if(data.vibrations !== undefined){
const err64 = {instancePath:instancePath+"/vibrations",schemaPath:"#/allOf/3/then/then/properties/vibrations/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[3].then.then.properties.vibrations,data:data.vibrations};
if(vErrors === null){
vErrors = [err64];
}
else {
vErrors.push(err64);
}
errors++;
}
if(data.internal_rotors !== undefined){
const err65 = {instancePath:instancePath+"/internal_rotors",schemaPath:"#/allOf/3/then/then/properties/internal_rotors/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[3].then.then.properties.internal_rotors,data:data.internal_rotors};
if(vErrors === null){
vErrors = [err65];
}
else {
vErrors.push(err65);
}
errors++;
}
if(data.electronic_levels !== undefined){
const err66 = {instancePath:instancePath+"/electronic_levels",schemaPath:"#/allOf/3/then/then/properties/electronic_levels/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[3].then.then.properties.electronic_levels,data:data.electronic_levels};
if(vErrors === null){
vErrors = [err66];
}
else {
vErrors.push(err66);
}
errors++;
}
if(data.vibration_scale_factor !== undefined){
const err67 = {instancePath:instancePath+"/vibration_scale_factor",schemaPath:"#/allOf/3/then/then/properties/vibration_scale_factor/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[3].then.then.properties.vibration_scale_factor,data:data.vibration_scale_factor};
if(vErrors === null){
vErrors = [err67];
}
else {
vErrors.push(err67);
}
errors++;
}
if(data.anharmonicity !== undefined){
const err68 = {instancePath:instancePath+"/anharmonicity",schemaPath:"#/allOf/3/then/then/properties/anharmonicity/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[3].then.then.properties.anharmonicity,data:data.anharmonicity};
if(vErrors === null){
vErrors = [err68];
}
else {
vErrors.push(err68);
}
errors++;
}
if(data.centrifugal_distortion !== undefined){
const err69 = {instancePath:instancePath+"/centrifugal_distortion",schemaPath:"#/allOf/3/then/then/properties/centrifugal_distortion/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[3].then.then.properties.centrifugal_distortion,data:data.centrifugal_distortion};
if(vErrors === null){
vErrors = [err69];
}
else {
vErrors.push(err69);
}
errors++;
}
if(data.dissociation_energy !== undefined){
const err70 = {instancePath:instancePath+"/dissociation_energy",schemaPath:"#/allOf/3/then/then/properties/dissociation_energy/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[3].then.then.properties.dissociation_energy,data:data.dissociation_energy};
if(vErrors === null){
vErrors = [err70];
}
else {
vErrors.push(err70);
}
errors++;
}
if(data.geometry !== undefined){
const err71 = {instancePath:instancePath+"/geometry",schemaPath:"#/allOf/3/then/then/properties/geometry/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[3].then.then.properties.geometry,data:data.geometry};
if(vErrors === null){
vErrors = [err71];
}
else {
vErrors.push(err71);
}
errors++;
}
if(data.geometry_file !== undefined){
const err72 = {instancePath:instancePath+"/geometry_file",schemaPath:"#/allOf/3/then/then/properties/geometry_file/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[3].then.then.properties.geometry_file,data:data.geometry_file};
if(vErrors === null){
vErrors = [err72];
}
else {
vErrors.push(err72);
}
errors++;
}
}
var _valid5 = _errs27 === errors;
valid14 = _valid5;
if(valid14){
var props3 = {};
props3.symmetry_number = true;
props3.rotational_constants = true;
props3.moments_of_inertia = true;
props3.vibrations = true;
props3.internal_rotors = true;
props3.electronic_levels = true;
props3.vibration_scale_factor = true;
props3.anharmonicity = true;
props3.centrifugal_distortion = true;
props3.dissociation_energy = true;
props3.geometry = true;
props3.geometry_file = true;
}
ifClause1 = "then";
}
else {
const _errs28 = errors;
if(data && typeof data == "object" && !Array.isArray(data)){
if(data.vibrations === undefined){
const err73 = {instancePath,schemaPath:"#/allOf/3/then/else/required",keyword:"required",params:{missingProperty: "vibrations"},message:"must have required property '"+"vibrations"+"'",schema:schema31.allOf[3].then.else.required,parentSchema:schema31.allOf[3].then.else,data};
if(vErrors === null){
vErrors = [err73];
}
else {
vErrors.push(err73);
}
errors++;
}
}
var _valid5 = _errs28 === errors;
valid14 = _valid5;
ifClause1 = "else";
}
if(!valid14){
const err74 = {instancePath,schemaPath:"#/allOf/3/then/if",keyword:"if",params:{failingKeyword: ifClause1},message:"must match \""+ifClause1+"\" schema",schema:schema31.allOf[3].then.if,parentSchema:schema31.allOf[3].then,data};
if(vErrors === null){
vErrors = [err74];
}
else {
vErrors.push(err74);
}
errors++;
}
if(data && typeof data == "object" && !Array.isArray(data)){
if(props3 !== true){
props3 = props3 || {};
props3.nuclear_spin_weights = true;
props3.nuclear_spin_mixture = true;
props3.electronic_states = true;
}
if(data.nuclear_spin_weights !== undefined){
const err75 = {instancePath:instancePath+"/nuclear_spin_weights",schemaPath:"#/allOf/3/then/properties/nuclear_spin_weights/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[3].then.properties.nuclear_spin_weights,data:data.nuclear_spin_weights};
if(vErrors === null){
vErrors = [err75];
}
else {
vErrors.push(err75);
}
errors++;
}
if(data.nuclear_spin_mixture !== undefined){
const err76 = {instancePath:instancePath+"/nuclear_spin_mixture",schemaPath:"#/allOf/3/then/properties/nuclear_spin_mixture/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[3].then.properties.nuclear_spin_mixture,data:data.nuclear_spin_mixture};
if(vErrors === null){
vErrors = [err76];
}
else {
vErrors.push(err76);
}
errors++;
}
if(data.electronic_states !== undefined){
const err77 = {instancePath:instancePath+"/electronic_states",schemaPath:"#/allOf/3/then/properties/electronic_states/false schema",keyword:"false schema",params:{},message:"boolean schema is false",schema:false,parentSchema:schema31.allOf[3].then.properties.electronic_states,data:data.electronic_states};
if(vErrors === null){
vErrors = [err77];
}
else {
vErrors.push(err77);
}
errors++;
}
}
var _valid4 = _errs24 === errors;
valid12 = _valid4;
if(valid12){
if(props3 !== true){
props3 = props3 || {};
props3.structure = true;
}
}
}
if(!valid12){
const err78 = {instancePath,schemaPath:"#/allOf/3/if",keyword:"if",params:{failingKeyword: "then"},message:"must match \"then\" schema",schema:schema31.allOf[3].if,parentSchema:schema31.allOf[3],data};
if(vErrors === null){
vErrors = [err78];
}
else {
vErrors.push(err78);
}
errors++;
}
if(props0 !== true && props3 !== undefined){
if(props3 === true){
props0 = true;
}
else {
props0 = props0 || {};
Object.assign(props0, props3);
}
}
if(data && typeof data == "object" && !Array.isArray(data)){
if(data.name === undefined){
const err79 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "name"},message:"must have required property '"+"name"+"'",schema:schema31.required,parentSchema:schema31,data};
if(vErrors === null){
vErrors = [err79];
}
else {
vErrors.push(err79);
}
errors++;
}
if(data.composition === undefined){
const err80 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "composition"},message:"must have required property '"+"composition"+"'",schema:schema31.required,parentSchema:schema31,data};
if(vErrors === null){
vErrors = [err80];
}
else {
vErrors.push(err80);
}
errors++;
}
if(data.enthalpy_of_formation === undefined){
const err81 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "enthalpy_of_formation"},message:"must have required property '"+"enthalpy_of_formation"+"'",schema:schema31.required,parentSchema:schema31,data};
if(vErrors === null){
vErrors = [err81];
}
else {
vErrors.push(err81);
}
errors++;
}
if(data.sources === undefined){
const err82 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "sources"},message:"must have required property '"+"sources"+"'",schema:schema31.required,parentSchema:schema31,data};
if(vErrors === null){
vErrors = [err82];
}
else {
vErrors.push(err82);
}
errors++;
}
if(data.structure === undefined){
const err83 = {instancePath,schemaPath:"#/required",keyword:"required",params:{missingProperty: "structure"},message:"must have required property '"+"structure"+"'",schema:schema31.required,parentSchema:schema31,data};
if(vErrors === null){
vErrors = [err83];
}
else {
vErrors.push(err83);
}
errors++;
}
for(const key0 in data){
if(!(func1.call(schema31.properties, key0))){
const err84 = {instancePath,schemaPath:"#/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key0},message:"must NOT have additional properties",schema:false,parentSchema:schema31,data};
if(vErrors === null){
vErrors = [err84];
}
else {
vErrors.push(err84);
}
errors++;
}
}
if(data.name !== undefined){
let data62 = data.name;
if(typeof data62 === "string"){
if(func2(data62) > 16){
const err85 = {instancePath:instancePath+"/name",schemaPath:"#/properties/name/maxLength",keyword:"maxLength",params:{limit: 16},message:"must NOT have more than 16 characters",schema:16,parentSchema:schema31.properties.name,data:data62};
if(vErrors === null){
vErrors = [err85];
}
else {
vErrors.push(err85);
}
errors++;
}
if(func2(data62) < 1){
const err86 = {instancePath:instancePath+"/name",schemaPath:"#/properties/name/minLength",keyword:"minLength",params:{limit: 1},message:"must NOT have fewer than 1 characters",schema:1,parentSchema:schema31.properties.name,data:data62};
if(vErrors === null){
vErrors = [err86];
}
else {
vErrors.push(err86);
}
errors++;
}
if(!pattern4.test(data62)){
const err87 = {instancePath:instancePath+"/name",schemaPath:"#/properties/name/pattern",keyword:"pattern",params:{pattern: "^[A-Za-z0-9()+*,._-]*$"},message:"must match pattern \""+"^[A-Za-z0-9()+*,._-]*$"+"\"",schema:"^[A-Za-z0-9()+*,._-]*$",parentSchema:schema31.properties.name,data:data62};
if(vErrors === null){
vErrors = [err87];
}
else {
vErrors.push(err87);
}
errors++;
}
}
else {
const err88 = {instancePath:instancePath+"/name",schemaPath:"#/properties/name/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema31.properties.name.type,parentSchema:schema31.properties.name,data:data62};
if(vErrors === null){
vErrors = [err88];
}
else {
vErrors.push(err88);
}
errors++;
}
}
if(data.composition !== undefined){
let data63 = data.composition;
if(data63 && typeof data63 == "object" && !Array.isArray(data63)){
if(Object.keys(data63).length < 1){
const err89 = {instancePath:instancePath+"/composition",schemaPath:"#/properties/composition/minProperties",keyword:"minProperties",params:{limit: 1},message:"must NOT have fewer than 1 properties",schema:1,parentSchema:schema31.properties.composition,data:data63};
if(vErrors === null){
vErrors = [err89];
}
else {
vErrors.push(err89);
}
errors++;
}
for(const key1 in data63){
let data64 = data63[key1];
if(!(((typeof data64 == "number") && (!(data64 % 1) && !isNaN(data64))) && (isFinite(data64)))){
const err90 = {instancePath:instancePath+"/composition/" + key1.replace(/~/g, "~0").replace(/\//g, "~1"),schemaPath:"#/$defs/positiveInteger/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema32.type,parentSchema:schema32,data:data64};
if(vErrors === null){
vErrors = [err90];
}
else {
vErrors.push(err90);
}
errors++;
}
if((typeof data64 == "number") && (isFinite(data64))){
if(data64 < 1 || isNaN(data64)){
const err91 = {instancePath:instancePath+"/composition/" + key1.replace(/~/g, "~0").replace(/\//g, "~1"),schemaPath:"#/$defs/positiveInteger/minimum",keyword:"minimum",params:{comparison: ">=", limit: 1},message:"must be >= 1",schema:1,parentSchema:schema32,data:data64};
if(vErrors === null){
vErrors = [err91];
}
else {
vErrors.push(err91);
}
errors++;
}
}
}
}
else {
const err92 = {instancePath:instancePath+"/composition",schemaPath:"#/properties/composition/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema31.properties.composition.type,parentSchema:schema31.properties.composition,data:data63};
if(vErrors === null){
vErrors = [err92];
}
else {
vErrors.push(err92);
}
errors++;
}
}
if(data.charge !== undefined){
let data65 = data.charge;
if(!(((typeof data65 == "number") && (!(data65 % 1) && !isNaN(data65))) && (isFinite(data65)))){
const err93 = {instancePath:instancePath+"/charge",schemaPath:"#/properties/charge/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema31.properties.charge.type,parentSchema:schema31.properties.charge,data:data65};
if(vErrors === null){
vErrors = [err93];
}
else {
vErrors.push(err93);
}
errors++;
}
}
if(data.enthalpy_of_formation !== undefined){
let data66 = data.enthalpy_of_formation;
if((!((typeof data66 == "number") && (isFinite(data66)))) && (!(data66 && typeof data66 == "object" && !Array.isArray(data66)))){
const err94 = {instancePath:instancePath+"/enthalpy_of_formation",schemaPath:"#/properties/enthalpy_of_formation/type",keyword:"type",params:{type: schema31.properties.enthalpy_of_formation.type},message:"must be number,object",schema:schema31.properties.enthalpy_of_formation.type,parentSchema:schema31.properties.enthalpy_of_formation,data:data66};
if(vErrors === null){
vErrors = [err94];
}
else {
vErrors.push(err94);
}
errors++;
}
if(data66 && typeof data66 == "object" && !Array.isArray(data66)){
if(data66.value === undefined){
const err95 = {instancePath:instancePath+"/enthalpy_of_formation",schemaPath:"#/properties/enthalpy_of_formation/required",keyword:"required",params:{missingProperty: "value"},message:"must have required property '"+"value"+"'",schema:schema31.properties.enthalpy_of_formation.required,parentSchema:schema31.properties.enthalpy_of_formation,data:data66};
if(vErrors === null){
vErrors = [err95];
}
else {
vErrors.push(err95);
}
errors++;
}
for(const key2 in data66){
if(!(((key2 === "value") || (key2 === "unit")) || (key2 === "temperature"))){
const err96 = {instancePath:instancePath+"/enthalpy_of_formation",schemaPath:"#/properties/enthalpy_of_formation/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key2},message:"must NOT have additional properties",schema:false,parentSchema:schema31.properties.enthalpy_of_formation,data:data66};
if(vErrors === null){
vErrors = [err96];
}
else {
vErrors.push(err96);
}
errors++;
}
}
if(data66.value !== undefined){
let data67 = data66.value;
if(!((typeof data67 == "number") && (isFinite(data67)))){
const err97 = {instancePath:instancePath+"/enthalpy_of_formation/value",schemaPath:"#/properties/enthalpy_of_formation/properties/value/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.enthalpy_of_formation.properties.value.type,parentSchema:schema31.properties.enthalpy_of_formation.properties.value,data:data67};
if(vErrors === null){
vErrors = [err97];
}
else {
vErrors.push(err97);
}
errors++;
}
}
if(data66.unit !== undefined){
let data68 = data66.unit;
if(!(((((data68 === "J/mol") || (data68 === "kJ/mol")) || (data68 === "kcal/mol")) || (data68 === "eV")) || (data68 === "cm-1"))){
const err98 = {instancePath:instancePath+"/enthalpy_of_formation/unit",schemaPath:"#/properties/enthalpy_of_formation/properties/unit/enum",keyword:"enum",params:{allowedValues: schema31.properties.enthalpy_of_formation.properties.unit.enum},message:"must be equal to one of the allowed values",schema:schema31.properties.enthalpy_of_formation.properties.unit.enum,parentSchema:schema31.properties.enthalpy_of_formation.properties.unit,data:data68};
if(vErrors === null){
vErrors = [err98];
}
else {
vErrors.push(err98);
}
errors++;
}
}
if(data66.temperature !== undefined){
let data69 = data66.temperature;
if(!((data69 === 298.15) || (data69 === 0))){
const err99 = {instancePath:instancePath+"/enthalpy_of_formation/temperature",schemaPath:"#/properties/enthalpy_of_formation/properties/temperature/enum",keyword:"enum",params:{allowedValues: schema31.properties.enthalpy_of_formation.properties.temperature.enum},message:"must be equal to one of the allowed values",schema:schema31.properties.enthalpy_of_formation.properties.temperature.enum,parentSchema:schema31.properties.enthalpy_of_formation.properties.temperature,data:data69};
if(vErrors === null){
vErrors = [err99];
}
else {
vErrors.push(err99);
}
errors++;
}
}
}
}
if(data.accepted_warnings !== undefined){
let data70 = data.accepted_warnings;
if(Array.isArray(data70)){
if(data70.length < 1){
const err100 = {instancePath:instancePath+"/accepted_warnings",schemaPath:"#/properties/accepted_warnings/minItems",keyword:"minItems",params:{limit: 1},message:"must NOT have fewer than 1 items",schema:1,parentSchema:schema31.properties.accepted_warnings,data:data70};
if(vErrors === null){
vErrors = [err100];
}
else {
vErrors.push(err100);
}
errors++;
}
const len0 = data70.length;
for(let i0=0; i0<len0; i0++){
let data71 = data70[i0];
if(data71 && typeof data71 == "object" && !Array.isArray(data71)){
if(data71.code === undefined){
const err101 = {instancePath:instancePath+"/accepted_warnings/" + i0,schemaPath:"#/$defs/acceptedWarning/required",keyword:"required",params:{missingProperty: "code"},message:"must have required property '"+"code"+"'",schema:schema33.required,parentSchema:schema33,data:data71};
if(vErrors === null){
vErrors = [err101];
}
else {
vErrors.push(err101);
}
errors++;
}
if(data71.reason === undefined){
const err102 = {instancePath:instancePath+"/accepted_warnings/" + i0,schemaPath:"#/$defs/acceptedWarning/required",keyword:"required",params:{missingProperty: "reason"},message:"must have required property '"+"reason"+"'",schema:schema33.required,parentSchema:schema33,data:data71};
if(vErrors === null){
vErrors = [err102];
}
else {
vErrors.push(err102);
}
errors++;
}
for(const key3 in data71){
if(!((key3 === "code") || (key3 === "reason"))){
const err103 = {instancePath:instancePath+"/accepted_warnings/" + i0,schemaPath:"#/$defs/acceptedWarning/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key3},message:"must NOT have additional properties",schema:false,parentSchema:schema33,data:data71};
if(vErrors === null){
vErrors = [err103];
}
else {
vErrors.push(err103);
}
errors++;
}
}
if(data71.code !== undefined){
let data72 = data71.code;
if(typeof data72 === "string"){
if(!pattern5.test(data72)){
const err104 = {instancePath:instancePath+"/accepted_warnings/" + i0+"/code",schemaPath:"#/$defs/acceptedWarning/properties/code/pattern",keyword:"pattern",params:{pattern: "^[a-z0-9]+(-[a-z0-9]+)*$"},message:"must match pattern \""+"^[a-z0-9]+(-[a-z0-9]+)*$"+"\"",schema:"^[a-z0-9]+(-[a-z0-9]+)*$",parentSchema:schema33.properties.code,data:data72};
if(vErrors === null){
vErrors = [err104];
}
else {
vErrors.push(err104);
}
errors++;
}
}
else {
const err105 = {instancePath:instancePath+"/accepted_warnings/" + i0+"/code",schemaPath:"#/$defs/acceptedWarning/properties/code/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema33.properties.code.type,parentSchema:schema33.properties.code,data:data72};
if(vErrors === null){
vErrors = [err105];
}
else {
vErrors.push(err105);
}
errors++;
}
}
if(data71.reason !== undefined){
let data73 = data71.reason;
if(typeof data73 === "string"){
if(func2(data73) < 10){
const err106 = {instancePath:instancePath+"/accepted_warnings/" + i0+"/reason",schemaPath:"#/$defs/acceptedWarning/properties/reason/minLength",keyword:"minLength",params:{limit: 10},message:"must NOT have fewer than 10 characters",schema:10,parentSchema:schema33.properties.reason,data:data73};
if(vErrors === null){
vErrors = [err106];
}
else {
vErrors.push(err106);
}
errors++;
}
}
else {
const err107 = {instancePath:instancePath+"/accepted_warnings/" + i0+"/reason",schemaPath:"#/$defs/acceptedWarning/properties/reason/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema33.properties.reason.type,parentSchema:schema33.properties.reason,data:data73};
if(vErrors === null){
vErrors = [err107];
}
else {
vErrors.push(err107);
}
errors++;
}
}
}
else {
const err108 = {instancePath:instancePath+"/accepted_warnings/" + i0,schemaPath:"#/$defs/acceptedWarning/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema33.type,parentSchema:schema33,data:data71};
if(vErrors === null){
vErrors = [err108];
}
else {
vErrors.push(err108);
}
errors++;
}
}
}
else {
const err109 = {instancePath:instancePath+"/accepted_warnings",schemaPath:"#/properties/accepted_warnings/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema31.properties.accepted_warnings.type,parentSchema:schema31.properties.accepted_warnings,data:data70};
if(vErrors === null){
vErrors = [err109];
}
else {
vErrors.push(err109);
}
errors++;
}
}
if(data.sources !== undefined){
let data74 = data.sources;
if(Array.isArray(data74)){
if(data74.length < 1){
const err110 = {instancePath:instancePath+"/sources",schemaPath:"#/properties/sources/minItems",keyword:"minItems",params:{limit: 1},message:"must NOT have fewer than 1 items",schema:1,parentSchema:schema31.properties.sources,data:data74};
if(vErrors === null){
vErrors = [err110];
}
else {
vErrors.push(err110);
}
errors++;
}
const len1 = data74.length;
for(let i1=0; i1<len1; i1++){
let data75 = data74[i1];
if(typeof data75 === "string"){
if(!pattern6.test(data75)){
const err111 = {instancePath:instancePath+"/sources/" + i1,schemaPath:"#/properties/sources/items/pattern",keyword:"pattern",params:{pattern: "\\S"},message:"must match pattern \""+"\\S"+"\"",schema:"\\S",parentSchema:schema31.properties.sources.items,data:data75};
if(vErrors === null){
vErrors = [err111];
}
else {
vErrors.push(err111);
}
errors++;
}
}
else {
const err112 = {instancePath:instancePath+"/sources/" + i1,schemaPath:"#/properties/sources/items/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema31.properties.sources.items.type,parentSchema:schema31.properties.sources.items,data:data75};
if(vErrors === null){
vErrors = [err112];
}
else {
vErrors.push(err112);
}
errors++;
}
}
}
else {
const err113 = {instancePath:instancePath+"/sources",schemaPath:"#/properties/sources/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema31.properties.sources.type,parentSchema:schema31.properties.sources,data:data74};
if(vErrors === null){
vErrors = [err113];
}
else {
vErrors.push(err113);
}
errors++;
}
}
if(data.structure !== undefined){
let data76 = data.structure;
if(!((((data76 === "atom") || (data76 === "diatomic")) || (data76 === "linear")) || (data76 === "nonlinear"))){
const err114 = {instancePath:instancePath+"/structure",schemaPath:"#/properties/structure/enum",keyword:"enum",params:{allowedValues: schema31.properties.structure.enum},message:"must be equal to one of the allowed values",schema:schema31.properties.structure.enum,parentSchema:schema31.properties.structure,data:data76};
if(vErrors === null){
vErrors = [err114];
}
else {
vErrors.push(err114);
}
errors++;
}
}
if(data.symmetry_number !== undefined){
let data77 = data.symmetry_number;
if(!(((typeof data77 == "number") && (!(data77 % 1) && !isNaN(data77))) && (isFinite(data77)))){
const err115 = {instancePath:instancePath+"/symmetry_number",schemaPath:"#/$defs/positiveInteger/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema32.type,parentSchema:schema32,data:data77};
if(vErrors === null){
vErrors = [err115];
}
else {
vErrors.push(err115);
}
errors++;
}
if((typeof data77 == "number") && (isFinite(data77))){
if(data77 < 1 || isNaN(data77)){
const err116 = {instancePath:instancePath+"/symmetry_number",schemaPath:"#/$defs/positiveInteger/minimum",keyword:"minimum",params:{comparison: ">=", limit: 1},message:"must be >= 1",schema:1,parentSchema:schema32,data:data77};
if(vErrors === null){
vErrors = [err116];
}
else {
vErrors.push(err116);
}
errors++;
}
}
}
if(data.electronic_levels !== undefined){
let data78 = data.electronic_levels;
if(Array.isArray(data78)){
if(data78.length < 1){
const err117 = {instancePath:instancePath+"/electronic_levels",schemaPath:"#/properties/electronic_levels/minItems",keyword:"minItems",params:{limit: 1},message:"must NOT have fewer than 1 items",schema:1,parentSchema:schema31.properties.electronic_levels,data:data78};
if(vErrors === null){
vErrors = [err117];
}
else {
vErrors.push(err117);
}
errors++;
}
const len2 = data78.length;
for(let i2=0; i2<len2; i2++){
if(!(validate21(data78[i2], {instancePath:instancePath+"/electronic_levels/" + i2,parentData:data78,parentDataProperty:i2,rootData,dynamicAnchors}))){
vErrors = vErrors === null ? validate21.errors : vErrors.concat(validate21.errors);
errors = vErrors.length;
}
}
}
else {
const err118 = {instancePath:instancePath+"/electronic_levels",schemaPath:"#/properties/electronic_levels/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema31.properties.electronic_levels.type,parentSchema:schema31.properties.electronic_levels,data:data78};
if(vErrors === null){
vErrors = [err118];
}
else {
vErrors.push(err118);
}
errors++;
}
}
if(data.rotational_constants !== undefined){
let data80 = data.rotational_constants;
if(Array.isArray(data80)){
if(data80.length > 3){
const err119 = {instancePath:instancePath+"/rotational_constants",schemaPath:"#/properties/rotational_constants/maxItems",keyword:"maxItems",params:{limit: 3},message:"must NOT have more than 3 items",schema:3,parentSchema:schema31.properties.rotational_constants,data:data80};
if(vErrors === null){
vErrors = [err119];
}
else {
vErrors.push(err119);
}
errors++;
}
if(data80.length < 1){
const err120 = {instancePath:instancePath+"/rotational_constants",schemaPath:"#/properties/rotational_constants/minItems",keyword:"minItems",params:{limit: 1},message:"must NOT have fewer than 1 items",schema:1,parentSchema:schema31.properties.rotational_constants,data:data80};
if(vErrors === null){
vErrors = [err120];
}
else {
vErrors.push(err120);
}
errors++;
}
const len3 = data80.length;
for(let i3=0; i3<len3; i3++){
let data81 = data80[i3];
if((!((typeof data81 == "number") && (isFinite(data81)))) && (!(data81 && typeof data81 == "object" && !Array.isArray(data81)))){
const err121 = {instancePath:instancePath+"/rotational_constants/" + i3,schemaPath:"#/$defs/rotationalConstant/type",keyword:"type",params:{type: schema38.type},message:"must be number,object",schema:schema38.type,parentSchema:schema38,data:data81};
if(vErrors === null){
vErrors = [err121];
}
else {
vErrors.push(err121);
}
errors++;
}
if((typeof data81 == "number") && (isFinite(data81))){
if(data81 <= 0 || isNaN(data81)){
const err122 = {instancePath:instancePath+"/rotational_constants/" + i3,schemaPath:"#/$defs/rotationalConstant/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema38,data:data81};
if(vErrors === null){
vErrors = [err122];
}
else {
vErrors.push(err122);
}
errors++;
}
}
if(data81 && typeof data81 == "object" && !Array.isArray(data81)){
if(data81.value === undefined){
const err123 = {instancePath:instancePath+"/rotational_constants/" + i3,schemaPath:"#/$defs/rotationalConstant/required",keyword:"required",params:{missingProperty: "value"},message:"must have required property '"+"value"+"'",schema:schema38.required,parentSchema:schema38,data:data81};
if(vErrors === null){
vErrors = [err123];
}
else {
vErrors.push(err123);
}
errors++;
}
if(data81.unit === undefined){
const err124 = {instancePath:instancePath+"/rotational_constants/" + i3,schemaPath:"#/$defs/rotationalConstant/required",keyword:"required",params:{missingProperty: "unit"},message:"must have required property '"+"unit"+"'",schema:schema38.required,parentSchema:schema38,data:data81};
if(vErrors === null){
vErrors = [err124];
}
else {
vErrors.push(err124);
}
errors++;
}
for(const key4 in data81){
if(!((key4 === "value") || (key4 === "unit"))){
const err125 = {instancePath:instancePath+"/rotational_constants/" + i3,schemaPath:"#/$defs/rotationalConstant/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key4},message:"must NOT have additional properties",schema:false,parentSchema:schema38,data:data81};
if(vErrors === null){
vErrors = [err125];
}
else {
vErrors.push(err125);
}
errors++;
}
}
if(data81.value !== undefined){
let data82 = data81.value;
if((typeof data82 == "number") && (isFinite(data82))){
if(data82 <= 0 || isNaN(data82)){
const err126 = {instancePath:instancePath+"/rotational_constants/" + i3+"/value",schemaPath:"#/$defs/rotationalConstant/properties/value/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema38.properties.value,data:data82};
if(vErrors === null){
vErrors = [err126];
}
else {
vErrors.push(err126);
}
errors++;
}
}
else {
const err127 = {instancePath:instancePath+"/rotational_constants/" + i3+"/value",schemaPath:"#/$defs/rotationalConstant/properties/value/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema38.properties.value.type,parentSchema:schema38.properties.value,data:data82};
if(vErrors === null){
vErrors = [err127];
}
else {
vErrors.push(err127);
}
errors++;
}
}
if(data81.unit !== undefined){
let data83 = data81.unit;
if(!((((((((data83 === "cm-1") || (data83 === "eV")) || (data83 === "K")) || (data83 === "J/mol")) || (data83 === "kJ/mol")) || (data83 === "kcal/mol")) || (data83 === "MHz")) || (data83 === "GHz"))){
const err128 = {instancePath:instancePath+"/rotational_constants/" + i3+"/unit",schemaPath:"#/$defs/rotationalConstant/properties/unit/enum",keyword:"enum",params:{allowedValues: schema38.properties.unit.enum},message:"must be equal to one of the allowed values",schema:schema38.properties.unit.enum,parentSchema:schema38.properties.unit,data:data83};
if(vErrors === null){
vErrors = [err128];
}
else {
vErrors.push(err128);
}
errors++;
}
}
}
}
}
else {
const err129 = {instancePath:instancePath+"/rotational_constants",schemaPath:"#/properties/rotational_constants/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema31.properties.rotational_constants.type,parentSchema:schema31.properties.rotational_constants,data:data80};
if(vErrors === null){
vErrors = [err129];
}
else {
vErrors.push(err129);
}
errors++;
}
}
if(data.moments_of_inertia !== undefined){
let data84 = data.moments_of_inertia;
if(Array.isArray(data84)){
if(data84.length > 3){
const err130 = {instancePath:instancePath+"/moments_of_inertia",schemaPath:"#/properties/moments_of_inertia/maxItems",keyword:"maxItems",params:{limit: 3},message:"must NOT have more than 3 items",schema:3,parentSchema:schema31.properties.moments_of_inertia,data:data84};
if(vErrors === null){
vErrors = [err130];
}
else {
vErrors.push(err130);
}
errors++;
}
if(data84.length < 1){
const err131 = {instancePath:instancePath+"/moments_of_inertia",schemaPath:"#/properties/moments_of_inertia/minItems",keyword:"minItems",params:{limit: 1},message:"must NOT have fewer than 1 items",schema:1,parentSchema:schema31.properties.moments_of_inertia,data:data84};
if(vErrors === null){
vErrors = [err131];
}
else {
vErrors.push(err131);
}
errors++;
}
const len4 = data84.length;
for(let i4=0; i4<len4; i4++){
let data85 = data84[i4];
if((!((typeof data85 == "number") && (isFinite(data85)))) && (!(data85 && typeof data85 == "object" && !Array.isArray(data85)))){
const err132 = {instancePath:instancePath+"/moments_of_inertia/" + i4,schemaPath:"#/$defs/momentOfInertia/type",keyword:"type",params:{type: schema39.type},message:"must be number,object",schema:schema39.type,parentSchema:schema39,data:data85};
if(vErrors === null){
vErrors = [err132];
}
else {
vErrors.push(err132);
}
errors++;
}
if((typeof data85 == "number") && (isFinite(data85))){
if(data85 <= 0 || isNaN(data85)){
const err133 = {instancePath:instancePath+"/moments_of_inertia/" + i4,schemaPath:"#/$defs/momentOfInertia/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema39,data:data85};
if(vErrors === null){
vErrors = [err133];
}
else {
vErrors.push(err133);
}
errors++;
}
}
if(data85 && typeof data85 == "object" && !Array.isArray(data85)){
if(data85.value === undefined){
const err134 = {instancePath:instancePath+"/moments_of_inertia/" + i4,schemaPath:"#/$defs/momentOfInertia/required",keyword:"required",params:{missingProperty: "value"},message:"must have required property '"+"value"+"'",schema:schema39.required,parentSchema:schema39,data:data85};
if(vErrors === null){
vErrors = [err134];
}
else {
vErrors.push(err134);
}
errors++;
}
if(data85.unit === undefined){
const err135 = {instancePath:instancePath+"/moments_of_inertia/" + i4,schemaPath:"#/$defs/momentOfInertia/required",keyword:"required",params:{missingProperty: "unit"},message:"must have required property '"+"unit"+"'",schema:schema39.required,parentSchema:schema39,data:data85};
if(vErrors === null){
vErrors = [err135];
}
else {
vErrors.push(err135);
}
errors++;
}
for(const key5 in data85){
if(!((key5 === "value") || (key5 === "unit"))){
const err136 = {instancePath:instancePath+"/moments_of_inertia/" + i4,schemaPath:"#/$defs/momentOfInertia/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key5},message:"must NOT have additional properties",schema:false,parentSchema:schema39,data:data85};
if(vErrors === null){
vErrors = [err136];
}
else {
vErrors.push(err136);
}
errors++;
}
}
if(data85.value !== undefined){
let data86 = data85.value;
if((typeof data86 == "number") && (isFinite(data86))){
if(data86 <= 0 || isNaN(data86)){
const err137 = {instancePath:instancePath+"/moments_of_inertia/" + i4+"/value",schemaPath:"#/$defs/momentOfInertia/properties/value/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema39.properties.value,data:data86};
if(vErrors === null){
vErrors = [err137];
}
else {
vErrors.push(err137);
}
errors++;
}
}
else {
const err138 = {instancePath:instancePath+"/moments_of_inertia/" + i4+"/value",schemaPath:"#/$defs/momentOfInertia/properties/value/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema39.properties.value.type,parentSchema:schema39.properties.value,data:data86};
if(vErrors === null){
vErrors = [err138];
}
else {
vErrors.push(err138);
}
errors++;
}
}
if(data85.unit !== undefined){
let data87 = data85.unit;
if(!(((data87 === "amu*angstrom^2") || (data87 === "kg*m^2")) || (data87 === "g*cm^2"))){
const err139 = {instancePath:instancePath+"/moments_of_inertia/" + i4+"/unit",schemaPath:"#/$defs/momentOfInertia/properties/unit/enum",keyword:"enum",params:{allowedValues: schema39.properties.unit.enum},message:"must be equal to one of the allowed values",schema:schema39.properties.unit.enum,parentSchema:schema39.properties.unit,data:data87};
if(vErrors === null){
vErrors = [err139];
}
else {
vErrors.push(err139);
}
errors++;
}
}
}
}
}
else {
const err140 = {instancePath:instancePath+"/moments_of_inertia",schemaPath:"#/properties/moments_of_inertia/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema31.properties.moments_of_inertia.type,parentSchema:schema31.properties.moments_of_inertia,data:data84};
if(vErrors === null){
vErrors = [err140];
}
else {
vErrors.push(err140);
}
errors++;
}
}
if(data.geometry !== undefined){
let data88 = data.geometry;
if(Array.isArray(data88)){
if(data88.length < 2){
const err141 = {instancePath:instancePath+"/geometry",schemaPath:"#/properties/geometry/minItems",keyword:"minItems",params:{limit: 2},message:"must NOT have fewer than 2 items",schema:2,parentSchema:schema31.properties.geometry,data:data88};
if(vErrors === null){
vErrors = [err141];
}
else {
vErrors.push(err141);
}
errors++;
}
const len5 = data88.length;
for(let i5=0; i5<len5; i5++){
let data89 = data88[i5];
if(Array.isArray(data89)){
if(data89.length > 4){
const err142 = {instancePath:instancePath+"/geometry/" + i5,schemaPath:"#/$defs/geometryRow/maxItems",keyword:"maxItems",params:{limit: 4},message:"must NOT have more than 4 items",schema:4,parentSchema:schema40,data:data89};
if(vErrors === null){
vErrors = [err142];
}
else {
vErrors.push(err142);
}
errors++;
}
if(data89.length < 4){
const err143 = {instancePath:instancePath+"/geometry/" + i5,schemaPath:"#/$defs/geometryRow/minItems",keyword:"minItems",params:{limit: 4},message:"must NOT have fewer than 4 items",schema:4,parentSchema:schema40,data:data89};
if(vErrors === null){
vErrors = [err143];
}
else {
vErrors.push(err143);
}
errors++;
}
const len6 = data89.length;
if(len6 > 0){
let data90 = data89[0];
if(typeof data90 === "string"){
if(!pattern7.test(data90)){
const err144 = {instancePath:instancePath+"/geometry/" + i5+"/0",schemaPath:"#/$defs/geometryRow/prefixItems/0/pattern",keyword:"pattern",params:{pattern: "^([0-9]{1,3})?[A-Z][a-z]{0,2}$"},message:"must match pattern \""+"^([0-9]{1,3})?[A-Z][a-z]{0,2}$"+"\"",schema:"^([0-9]{1,3})?[A-Z][a-z]{0,2}$",parentSchema:schema40.prefixItems[0],data:data90};
if(vErrors === null){
vErrors = [err144];
}
else {
vErrors.push(err144);
}
errors++;
}
}
else {
const err145 = {instancePath:instancePath+"/geometry/" + i5+"/0",schemaPath:"#/$defs/geometryRow/prefixItems/0/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema40.prefixItems[0].type,parentSchema:schema40.prefixItems[0],data:data90};
if(vErrors === null){
vErrors = [err145];
}
else {
vErrors.push(err145);
}
errors++;
}
}
if(len6 > 1){
let data91 = data89[1];
if(!((typeof data91 == "number") && (isFinite(data91)))){
const err146 = {instancePath:instancePath+"/geometry/" + i5+"/1",schemaPath:"#/$defs/geometryRow/prefixItems/1/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema40.prefixItems[1].type,parentSchema:schema40.prefixItems[1],data:data91};
if(vErrors === null){
vErrors = [err146];
}
else {
vErrors.push(err146);
}
errors++;
}
}
if(len6 > 2){
let data92 = data89[2];
if(!((typeof data92 == "number") && (isFinite(data92)))){
const err147 = {instancePath:instancePath+"/geometry/" + i5+"/2",schemaPath:"#/$defs/geometryRow/prefixItems/2/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema40.prefixItems[2].type,parentSchema:schema40.prefixItems[2],data:data92};
if(vErrors === null){
vErrors = [err147];
}
else {
vErrors.push(err147);
}
errors++;
}
}
if(len6 > 3){
let data93 = data89[3];
if(!((typeof data93 == "number") && (isFinite(data93)))){
const err148 = {instancePath:instancePath+"/geometry/" + i5+"/3",schemaPath:"#/$defs/geometryRow/prefixItems/3/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema40.prefixItems[3].type,parentSchema:schema40.prefixItems[3],data:data93};
if(vErrors === null){
vErrors = [err148];
}
else {
vErrors.push(err148);
}
errors++;
}
}
}
else {
const err149 = {instancePath:instancePath+"/geometry/" + i5,schemaPath:"#/$defs/geometryRow/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema40.type,parentSchema:schema40,data:data89};
if(vErrors === null){
vErrors = [err149];
}
else {
vErrors.push(err149);
}
errors++;
}
}
}
else {
const err150 = {instancePath:instancePath+"/geometry",schemaPath:"#/properties/geometry/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema31.properties.geometry.type,parentSchema:schema31.properties.geometry,data:data88};
if(vErrors === null){
vErrors = [err150];
}
else {
vErrors.push(err150);
}
errors++;
}
}
if(data.geometry_file !== undefined){
let data94 = data.geometry_file;
if(typeof data94 === "string"){
if(func2(data94) < 1){
const err151 = {instancePath:instancePath+"/geometry_file",schemaPath:"#/properties/geometry_file/minLength",keyword:"minLength",params:{limit: 1},message:"must NOT have fewer than 1 characters",schema:1,parentSchema:schema31.properties.geometry_file,data:data94};
if(vErrors === null){
vErrors = [err151];
}
else {
vErrors.push(err151);
}
errors++;
}
if(!pattern8.test(data94)){
const err152 = {instancePath:instancePath+"/geometry_file",schemaPath:"#/properties/geometry_file/pattern",keyword:"pattern",params:{pattern: "^[^/\\\\].*\\.xyz$"},message:"must match pattern \""+"^[^/\\\\].*\\.xyz$"+"\"",schema:"^[^/\\\\].*\\.xyz$",parentSchema:schema31.properties.geometry_file,data:data94};
if(vErrors === null){
vErrors = [err152];
}
else {
vErrors.push(err152);
}
errors++;
}
}
else {
const err153 = {instancePath:instancePath+"/geometry_file",schemaPath:"#/properties/geometry_file/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema31.properties.geometry_file.type,parentSchema:schema31.properties.geometry_file,data:data94};
if(vErrors === null){
vErrors = [err153];
}
else {
vErrors.push(err153);
}
errors++;
}
}
if(data.optical_isomers !== undefined){
let data95 = data.optical_isomers;
if(!(((typeof data95 == "number") && (!(data95 % 1) && !isNaN(data95))) && (isFinite(data95)))){
const err154 = {instancePath:instancePath+"/optical_isomers",schemaPath:"#/$defs/positiveInteger/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema32.type,parentSchema:schema32,data:data95};
if(vErrors === null){
vErrors = [err154];
}
else {
vErrors.push(err154);
}
errors++;
}
if((typeof data95 == "number") && (isFinite(data95))){
if(data95 < 1 || isNaN(data95)){
const err155 = {instancePath:instancePath+"/optical_isomers",schemaPath:"#/$defs/positiveInteger/minimum",keyword:"minimum",params:{comparison: ">=", limit: 1},message:"must be >= 1",schema:1,parentSchema:schema32,data:data95};
if(vErrors === null){
vErrors = [err155];
}
else {
vErrors.push(err155);
}
errors++;
}
}
}
if(data.vibrations !== undefined){
let data96 = data.vibrations;
if(Array.isArray(data96)){
if(data96.length < 1){
const err156 = {instancePath:instancePath+"/vibrations",schemaPath:"#/properties/vibrations/minItems",keyword:"minItems",params:{limit: 1},message:"must NOT have fewer than 1 items",schema:1,parentSchema:schema31.properties.vibrations,data:data96};
if(vErrors === null){
vErrors = [err156];
}
else {
vErrors.push(err156);
}
errors++;
}
const len7 = data96.length;
for(let i6=0; i6<len7; i6++){
if(!(validate23(data96[i6], {instancePath:instancePath+"/vibrations/" + i6,parentData:data96,parentDataProperty:i6,rootData,dynamicAnchors}))){
vErrors = vErrors === null ? validate23.errors : vErrors.concat(validate23.errors);
errors = vErrors.length;
}
}
}
else {
const err157 = {instancePath:instancePath+"/vibrations",schemaPath:"#/properties/vibrations/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema31.properties.vibrations.type,parentSchema:schema31.properties.vibrations,data:data96};
if(vErrors === null){
vErrors = [err157];
}
else {
vErrors.push(err157);
}
errors++;
}
}
if(data.internal_rotors !== undefined){
let data98 = data.internal_rotors;
if(Array.isArray(data98)){
if(data98.length < 1){
const err158 = {instancePath:instancePath+"/internal_rotors",schemaPath:"#/properties/internal_rotors/minItems",keyword:"minItems",params:{limit: 1},message:"must NOT have fewer than 1 items",schema:1,parentSchema:schema31.properties.internal_rotors,data:data98};
if(vErrors === null){
vErrors = [err158];
}
else {
vErrors.push(err158);
}
errors++;
}
const len8 = data98.length;
for(let i7=0; i7<len8; i7++){
if(!(validate25(data98[i7], {instancePath:instancePath+"/internal_rotors/" + i7,parentData:data98,parentDataProperty:i7,rootData,dynamicAnchors}))){
vErrors = vErrors === null ? validate25.errors : vErrors.concat(validate25.errors);
errors = vErrors.length;
}
}
}
else {
const err159 = {instancePath:instancePath+"/internal_rotors",schemaPath:"#/properties/internal_rotors/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema31.properties.internal_rotors.type,parentSchema:schema31.properties.internal_rotors,data:data98};
if(vErrors === null){
vErrors = [err159];
}
else {
vErrors.push(err159);
}
errors++;
}
}
if(data.vibration_scale_factor !== undefined){
let data100 = data.vibration_scale_factor;
if(data100 && typeof data100 == "object" && !Array.isArray(data100)){
if(data100.value === undefined){
const err160 = {instancePath:instancePath+"/vibration_scale_factor",schemaPath:"#/$defs/vibrationScaleFactor/required",keyword:"required",params:{missingProperty: "value"},message:"must have required property '"+"value"+"'",schema:schema58.required,parentSchema:schema58,data:data100};
if(vErrors === null){
vErrors = [err160];
}
else {
vErrors.push(err160);
}
errors++;
}
if(data100.source === undefined){
const err161 = {instancePath:instancePath+"/vibration_scale_factor",schemaPath:"#/$defs/vibrationScaleFactor/required",keyword:"required",params:{missingProperty: "source"},message:"must have required property '"+"source"+"'",schema:schema58.required,parentSchema:schema58,data:data100};
if(vErrors === null){
vErrors = [err161];
}
else {
vErrors.push(err161);
}
errors++;
}
for(const key6 in data100){
if(!((key6 === "value") || (key6 === "source"))){
const err162 = {instancePath:instancePath+"/vibration_scale_factor",schemaPath:"#/$defs/vibrationScaleFactor/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key6},message:"must NOT have additional properties",schema:false,parentSchema:schema58,data:data100};
if(vErrors === null){
vErrors = [err162];
}
else {
vErrors.push(err162);
}
errors++;
}
}
if(data100.value !== undefined){
let data101 = data100.value;
if((typeof data101 == "number") && (isFinite(data101))){
if(data101 <= 0 || isNaN(data101)){
const err163 = {instancePath:instancePath+"/vibration_scale_factor/value",schemaPath:"#/$defs/vibrationScaleFactor/properties/value/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema58.properties.value,data:data101};
if(vErrors === null){
vErrors = [err163];
}
else {
vErrors.push(err163);
}
errors++;
}
}
else {
const err164 = {instancePath:instancePath+"/vibration_scale_factor/value",schemaPath:"#/$defs/vibrationScaleFactor/properties/value/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema58.properties.value.type,parentSchema:schema58.properties.value,data:data101};
if(vErrors === null){
vErrors = [err164];
}
else {
vErrors.push(err164);
}
errors++;
}
}
if(data100.source !== undefined){
let data102 = data100.source;
if(typeof data102 === "string"){
if(!pattern6.test(data102)){
const err165 = {instancePath:instancePath+"/vibration_scale_factor/source",schemaPath:"#/$defs/vibrationScaleFactor/properties/source/pattern",keyword:"pattern",params:{pattern: "\\S"},message:"must match pattern \""+"\\S"+"\"",schema:"\\S",parentSchema:schema58.properties.source,data:data102};
if(vErrors === null){
vErrors = [err165];
}
else {
vErrors.push(err165);
}
errors++;
}
}
else {
const err166 = {instancePath:instancePath+"/vibration_scale_factor/source",schemaPath:"#/$defs/vibrationScaleFactor/properties/source/type",keyword:"type",params:{type: "string"},message:"must be string",schema:schema58.properties.source.type,parentSchema:schema58.properties.source,data:data102};
if(vErrors === null){
vErrors = [err166];
}
else {
vErrors.push(err166);
}
errors++;
}
}
}
else {
const err167 = {instancePath:instancePath+"/vibration_scale_factor",schemaPath:"#/$defs/vibrationScaleFactor/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema58.type,parentSchema:schema58,data:data100};
if(vErrors === null){
vErrors = [err167];
}
else {
vErrors.push(err167);
}
errors++;
}
}
if(data.anharmonicity !== undefined){
if(!(validate29(data.anharmonicity, {instancePath:instancePath+"/anharmonicity",parentData:data,parentDataProperty:"anharmonicity",rootData,dynamicAnchors}))){
vErrors = vErrors === null ? validate29.errors : vErrors.concat(validate29.errors);
errors = vErrors.length;
}
}
if(data.centrifugal_distortion !== undefined){
let data104 = data.centrifugal_distortion;
if(data104 && typeof data104 == "object" && !Array.isArray(data104)){
if(data104.DJ === undefined){
const err168 = {instancePath:instancePath+"/centrifugal_distortion",schemaPath:"#/$defs/centrifugalDistortion/required",keyword:"required",params:{missingProperty: "DJ"},message:"must have required property '"+"DJ"+"'",schema:schema63.required,parentSchema:schema63,data:data104};
if(vErrors === null){
vErrors = [err168];
}
else {
vErrors.push(err168);
}
errors++;
}
for(const key7 in data104){
if(!(((((key7 === "DJ") || (key7 === "DJK")) || (key7 === "DK")) || (key7 === "dJ")) || (key7 === "dK"))){
const err169 = {instancePath:instancePath+"/centrifugal_distortion",schemaPath:"#/$defs/centrifugalDistortion/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key7},message:"must NOT have additional properties",schema:false,parentSchema:schema63,data:data104};
if(vErrors === null){
vErrors = [err169];
}
else {
vErrors.push(err169);
}
errors++;
}
}
if(data104.DJ !== undefined){
let data105 = data104.DJ;
if(!((typeof data105 == "number") && (isFinite(data105)))){
const err170 = {instancePath:instancePath+"/centrifugal_distortion/DJ",schemaPath:"#/$defs/centrifugalDistortion/properties/DJ/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema63.properties.DJ.type,parentSchema:schema63.properties.DJ,data:data105};
if(vErrors === null){
vErrors = [err170];
}
else {
vErrors.push(err170);
}
errors++;
}
}
if(data104.DJK !== undefined){
let data106 = data104.DJK;
if(!((typeof data106 == "number") && (isFinite(data106)))){
const err171 = {instancePath:instancePath+"/centrifugal_distortion/DJK",schemaPath:"#/$defs/centrifugalDistortion/properties/DJK/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema63.properties.DJK.type,parentSchema:schema63.properties.DJK,data:data106};
if(vErrors === null){
vErrors = [err171];
}
else {
vErrors.push(err171);
}
errors++;
}
}
if(data104.DK !== undefined){
let data107 = data104.DK;
if(!((typeof data107 == "number") && (isFinite(data107)))){
const err172 = {instancePath:instancePath+"/centrifugal_distortion/DK",schemaPath:"#/$defs/centrifugalDistortion/properties/DK/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema63.properties.DK.type,parentSchema:schema63.properties.DK,data:data107};
if(vErrors === null){
vErrors = [err172];
}
else {
vErrors.push(err172);
}
errors++;
}
}
if(data104.dJ !== undefined){
let data108 = data104.dJ;
if(!((typeof data108 == "number") && (isFinite(data108)))){
const err173 = {instancePath:instancePath+"/centrifugal_distortion/dJ",schemaPath:"#/$defs/centrifugalDistortion/properties/dJ/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema63.properties.dJ.type,parentSchema:schema63.properties.dJ,data:data108};
if(vErrors === null){
vErrors = [err173];
}
else {
vErrors.push(err173);
}
errors++;
}
}
if(data104.dK !== undefined){
let data109 = data104.dK;
if(!((typeof data109 == "number") && (isFinite(data109)))){
const err174 = {instancePath:instancePath+"/centrifugal_distortion/dK",schemaPath:"#/$defs/centrifugalDistortion/properties/dK/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema63.properties.dK.type,parentSchema:schema63.properties.dK,data:data109};
if(vErrors === null){
vErrors = [err174];
}
else {
vErrors.push(err174);
}
errors++;
}
}
}
else {
const err175 = {instancePath:instancePath+"/centrifugal_distortion",schemaPath:"#/$defs/centrifugalDistortion/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema63.type,parentSchema:schema63,data:data104};
if(vErrors === null){
vErrors = [err175];
}
else {
vErrors.push(err175);
}
errors++;
}
}
if(data.conformers !== undefined){
let data110 = data.conformers;
if(Array.isArray(data110)){
if(data110.length < 1){
const err176 = {instancePath:instancePath+"/conformers",schemaPath:"#/properties/conformers/minItems",keyword:"minItems",params:{limit: 1},message:"must NOT have fewer than 1 items",schema:1,parentSchema:schema31.properties.conformers,data:data110};
if(vErrors === null){
vErrors = [err176];
}
else {
vErrors.push(err176);
}
errors++;
}
const len9 = data110.length;
for(let i8=0; i8<len9; i8++){
if(!(validate34(data110[i8], {instancePath:instancePath+"/conformers/" + i8,parentData:data110,parentDataProperty:i8,rootData,dynamicAnchors}))){
vErrors = vErrors === null ? validate34.errors : vErrors.concat(validate34.errors);
errors = vErrors.length;
}
}
}
else {
const err177 = {instancePath:instancePath+"/conformers",schemaPath:"#/properties/conformers/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema31.properties.conformers.type,parentSchema:schema31.properties.conformers,data:data110};
if(vErrors === null){
vErrors = [err177];
}
else {
vErrors.push(err177);
}
errors++;
}
}
if(data.dissociation_energy !== undefined){
let data112 = data.dissociation_energy;
if((!((typeof data112 == "number") && (isFinite(data112)))) && (!(data112 && typeof data112 == "object" && !Array.isArray(data112)))){
const err178 = {instancePath:instancePath+"/dissociation_energy",schemaPath:"#/$defs/positiveEnergy/type",keyword:"type",params:{type: schema72.type},message:"must be number,object",schema:schema72.type,parentSchema:schema72,data:data112};
if(vErrors === null){
vErrors = [err178];
}
else {
vErrors.push(err178);
}
errors++;
}
if((typeof data112 == "number") && (isFinite(data112))){
if(data112 <= 0 || isNaN(data112)){
const err179 = {instancePath:instancePath+"/dissociation_energy",schemaPath:"#/$defs/positiveEnergy/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema72,data:data112};
if(vErrors === null){
vErrors = [err179];
}
else {
vErrors.push(err179);
}
errors++;
}
}
if(data112 && typeof data112 == "object" && !Array.isArray(data112)){
if(data112.value === undefined){
const err180 = {instancePath:instancePath+"/dissociation_energy",schemaPath:"#/$defs/positiveEnergy/required",keyword:"required",params:{missingProperty: "value"},message:"must have required property '"+"value"+"'",schema:schema72.required,parentSchema:schema72,data:data112};
if(vErrors === null){
vErrors = [err180];
}
else {
vErrors.push(err180);
}
errors++;
}
if(data112.unit === undefined){
const err181 = {instancePath:instancePath+"/dissociation_energy",schemaPath:"#/$defs/positiveEnergy/required",keyword:"required",params:{missingProperty: "unit"},message:"must have required property '"+"unit"+"'",schema:schema72.required,parentSchema:schema72,data:data112};
if(vErrors === null){
vErrors = [err181];
}
else {
vErrors.push(err181);
}
errors++;
}
for(const key8 in data112){
if(!((key8 === "value") || (key8 === "unit"))){
const err182 = {instancePath:instancePath+"/dissociation_energy",schemaPath:"#/$defs/positiveEnergy/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key8},message:"must NOT have additional properties",schema:false,parentSchema:schema72,data:data112};
if(vErrors === null){
vErrors = [err182];
}
else {
vErrors.push(err182);
}
errors++;
}
}
if(data112.value !== undefined){
let data113 = data112.value;
if((typeof data113 == "number") && (isFinite(data113))){
if(data113 <= 0 || isNaN(data113)){
const err183 = {instancePath:instancePath+"/dissociation_energy/value",schemaPath:"#/$defs/positiveEnergy/properties/value/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema72.properties.value,data:data113};
if(vErrors === null){
vErrors = [err183];
}
else {
vErrors.push(err183);
}
errors++;
}
}
else {
const err184 = {instancePath:instancePath+"/dissociation_energy/value",schemaPath:"#/$defs/positiveEnergy/properties/value/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema72.properties.value.type,parentSchema:schema72.properties.value,data:data113};
if(vErrors === null){
vErrors = [err184];
}
else {
vErrors.push(err184);
}
errors++;
}
}
if(data112.unit !== undefined){
let data114 = data112.unit;
if(!((((((data114 === "cm-1") || (data114 === "eV")) || (data114 === "K")) || (data114 === "J/mol")) || (data114 === "kJ/mol")) || (data114 === "kcal/mol"))){
const err185 = {instancePath:instancePath+"/dissociation_energy/unit",schemaPath:"#/$defs/positiveEnergy/properties/unit/enum",keyword:"enum",params:{allowedValues: schema72.properties.unit.enum},message:"must be equal to one of the allowed values",schema:schema72.properties.unit.enum,parentSchema:schema72.properties.unit,data:data114};
if(vErrors === null){
vErrors = [err185];
}
else {
vErrors.push(err185);
}
errors++;
}
}
}
}
if(data.nuclear_spin_weights !== undefined){
let data115 = data.nuclear_spin_weights;
if(data115 && typeof data115 == "object" && !Array.isArray(data115)){
if(data115.even === undefined){
const err186 = {instancePath:instancePath+"/nuclear_spin_weights",schemaPath:"#/properties/nuclear_spin_weights/required",keyword:"required",params:{missingProperty: "even"},message:"must have required property '"+"even"+"'",schema:schema31.properties.nuclear_spin_weights.required,parentSchema:schema31.properties.nuclear_spin_weights,data:data115};
if(vErrors === null){
vErrors = [err186];
}
else {
vErrors.push(err186);
}
errors++;
}
if(data115.odd === undefined){
const err187 = {instancePath:instancePath+"/nuclear_spin_weights",schemaPath:"#/properties/nuclear_spin_weights/required",keyword:"required",params:{missingProperty: "odd"},message:"must have required property '"+"odd"+"'",schema:schema31.properties.nuclear_spin_weights.required,parentSchema:schema31.properties.nuclear_spin_weights,data:data115};
if(vErrors === null){
vErrors = [err187];
}
else {
vErrors.push(err187);
}
errors++;
}
for(const key9 in data115){
if(!((key9 === "even") || (key9 === "odd"))){
const err188 = {instancePath:instancePath+"/nuclear_spin_weights",schemaPath:"#/properties/nuclear_spin_weights/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key9},message:"must NOT have additional properties",schema:false,parentSchema:schema31.properties.nuclear_spin_weights,data:data115};
if(vErrors === null){
vErrors = [err188];
}
else {
vErrors.push(err188);
}
errors++;
}
}
if(data115.even !== undefined){
let data116 = data115.even;
if(!(((typeof data116 == "number") && (!(data116 % 1) && !isNaN(data116))) && (isFinite(data116)))){
const err189 = {instancePath:instancePath+"/nuclear_spin_weights/even",schemaPath:"#/properties/nuclear_spin_weights/properties/even/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema31.properties.nuclear_spin_weights.properties.even.type,parentSchema:schema31.properties.nuclear_spin_weights.properties.even,data:data116};
if(vErrors === null){
vErrors = [err189];
}
else {
vErrors.push(err189);
}
errors++;
}
if((typeof data116 == "number") && (isFinite(data116))){
if(data116 < 0 || isNaN(data116)){
const err190 = {instancePath:instancePath+"/nuclear_spin_weights/even",schemaPath:"#/properties/nuclear_spin_weights/properties/even/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema31.properties.nuclear_spin_weights.properties.even,data:data116};
if(vErrors === null){
vErrors = [err190];
}
else {
vErrors.push(err190);
}
errors++;
}
}
}
if(data115.odd !== undefined){
let data117 = data115.odd;
if(!(((typeof data117 == "number") && (!(data117 % 1) && !isNaN(data117))) && (isFinite(data117)))){
const err191 = {instancePath:instancePath+"/nuclear_spin_weights/odd",schemaPath:"#/properties/nuclear_spin_weights/properties/odd/type",keyword:"type",params:{type: "integer"},message:"must be integer",schema:schema31.properties.nuclear_spin_weights.properties.odd.type,parentSchema:schema31.properties.nuclear_spin_weights.properties.odd,data:data117};
if(vErrors === null){
vErrors = [err191];
}
else {
vErrors.push(err191);
}
errors++;
}
if((typeof data117 == "number") && (isFinite(data117))){
if(data117 < 0 || isNaN(data117)){
const err192 = {instancePath:instancePath+"/nuclear_spin_weights/odd",schemaPath:"#/properties/nuclear_spin_weights/properties/odd/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema31.properties.nuclear_spin_weights.properties.odd,data:data117};
if(vErrors === null){
vErrors = [err192];
}
else {
vErrors.push(err192);
}
errors++;
}
}
}
}
else {
const err193 = {instancePath:instancePath+"/nuclear_spin_weights",schemaPath:"#/properties/nuclear_spin_weights/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema31.properties.nuclear_spin_weights.type,parentSchema:schema31.properties.nuclear_spin_weights,data:data115};
if(vErrors === null){
vErrors = [err193];
}
else {
vErrors.push(err193);
}
errors++;
}
}
if(data.nuclear_spin_mixture !== undefined){
let data118 = data.nuclear_spin_mixture;
if(!((data118 === "equilibrium") || (data118 === "frozen"))){
const err194 = {instancePath:instancePath+"/nuclear_spin_mixture",schemaPath:"#/properties/nuclear_spin_mixture/enum",keyword:"enum",params:{allowedValues: schema31.properties.nuclear_spin_mixture.enum},message:"must be equal to one of the allowed values",schema:schema31.properties.nuclear_spin_mixture.enum,parentSchema:schema31.properties.nuclear_spin_mixture,data:data118};
if(vErrors === null){
vErrors = [err194];
}
else {
vErrors.push(err194);
}
errors++;
}
}
if(data.electronic_states !== undefined){
let data119 = data.electronic_states;
if(Array.isArray(data119)){
if(data119.length < 1){
const err195 = {instancePath:instancePath+"/electronic_states",schemaPath:"#/properties/electronic_states/minItems",keyword:"minItems",params:{limit: 1},message:"must NOT have fewer than 1 items",schema:1,parentSchema:schema31.properties.electronic_states,data:data119};
if(vErrors === null){
vErrors = [err195];
}
else {
vErrors.push(err195);
}
errors++;
}
const len10 = data119.length;
for(let i9=0; i9<len10; i9++){
if(!(validate40(data119[i9], {instancePath:instancePath+"/electronic_states/" + i9,parentData:data119,parentDataProperty:i9,rootData,dynamicAnchors}))){
vErrors = vErrors === null ? validate40.errors : vErrors.concat(validate40.errors);
errors = vErrors.length;
}
}
}
else {
const err196 = {instancePath:instancePath+"/electronic_states",schemaPath:"#/properties/electronic_states/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema31.properties.electronic_states.type,parentSchema:schema31.properties.electronic_states,data:data119};
if(vErrors === null){
vErrors = [err196];
}
else {
vErrors.push(err196);
}
errors++;
}
}
if(data.uncertainties !== undefined){
let data121 = data.uncertainties;
if(data121 && typeof data121 == "object" && !Array.isArray(data121)){
for(const key10 in data121){
if(!((((((((key10 === "vibrations") || (key10 === "scale_factor")) || (key10 === "rotational_constants")) || (key10 === "electronic_energies")) || (key10 === "barriers")) || (key10 === "anharmonic_constants")) || (key10 === "enthalpy_of_formation")) || (key10 === "molar_mass"))){
const err197 = {instancePath:instancePath+"/uncertainties",schemaPath:"#/properties/uncertainties/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key10},message:"must NOT have additional properties",schema:false,parentSchema:schema31.properties.uncertainties,data:data121};
if(vErrors === null){
vErrors = [err197];
}
else {
vErrors.push(err197);
}
errors++;
}
}
if(data121.vibrations !== undefined){
let data122 = data121.vibrations;
const _errs158 = errors;
let valid59 = false;
const _errs159 = errors;
if((typeof data122 == "number") && (isFinite(data122))){
if(data122 > 1 || isNaN(data122)){
const err198 = {instancePath:instancePath+"/uncertainties/vibrations",schemaPath:"#/properties/uncertainties/properties/vibrations/anyOf/0/maximum",keyword:"maximum",params:{comparison: "<=", limit: 1},message:"must be <= 1",schema:1,parentSchema:schema31.properties.uncertainties.properties.vibrations.anyOf[0],data:data122};
if(vErrors === null){
vErrors = [err198];
}
else {
vErrors.push(err198);
}
errors++;
}
if(data122 < 0 || isNaN(data122)){
const err199 = {instancePath:instancePath+"/uncertainties/vibrations",schemaPath:"#/properties/uncertainties/properties/vibrations/anyOf/0/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema31.properties.uncertainties.properties.vibrations.anyOf[0],data:data122};
if(vErrors === null){
vErrors = [err199];
}
else {
vErrors.push(err199);
}
errors++;
}
}
else {
const err200 = {instancePath:instancePath+"/uncertainties/vibrations",schemaPath:"#/properties/uncertainties/properties/vibrations/anyOf/0/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.uncertainties.properties.vibrations.anyOf[0].type,parentSchema:schema31.properties.uncertainties.properties.vibrations.anyOf[0],data:data122};
if(vErrors === null){
vErrors = [err200];
}
else {
vErrors.push(err200);
}
errors++;
}
var _valid6 = _errs159 === errors;
valid59 = valid59 || _valid6;
const _errs161 = errors;
if(Array.isArray(data122)){
const len11 = data122.length;
for(let i10=0; i10<len11; i10++){
let data123 = data122[i10];
if((typeof data123 == "number") && (isFinite(data123))){
if(data123 < 0 || isNaN(data123)){
const err201 = {instancePath:instancePath+"/uncertainties/vibrations/" + i10,schemaPath:"#/properties/uncertainties/properties/vibrations/anyOf/1/items/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema31.properties.uncertainties.properties.vibrations.anyOf[1].items,data:data123};
if(vErrors === null){
vErrors = [err201];
}
else {
vErrors.push(err201);
}
errors++;
}
}
else {
const err202 = {instancePath:instancePath+"/uncertainties/vibrations/" + i10,schemaPath:"#/properties/uncertainties/properties/vibrations/anyOf/1/items/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.uncertainties.properties.vibrations.anyOf[1].items.type,parentSchema:schema31.properties.uncertainties.properties.vibrations.anyOf[1].items,data:data123};
if(vErrors === null){
vErrors = [err202];
}
else {
vErrors.push(err202);
}
errors++;
}
}
}
else {
const err203 = {instancePath:instancePath+"/uncertainties/vibrations",schemaPath:"#/properties/uncertainties/properties/vibrations/anyOf/1/type",keyword:"type",params:{type: "array"},message:"must be array",schema:schema31.properties.uncertainties.properties.vibrations.anyOf[1].type,parentSchema:schema31.properties.uncertainties.properties.vibrations.anyOf[1],data:data122};
if(vErrors === null){
vErrors = [err203];
}
else {
vErrors.push(err203);
}
errors++;
}
var _valid6 = _errs161 === errors;
valid59 = valid59 || _valid6;
if(!valid59){
const err204 = {instancePath:instancePath+"/uncertainties/vibrations",schemaPath:"#/properties/uncertainties/properties/vibrations/anyOf",keyword:"anyOf",params:{},message:"must match a schema in anyOf",schema:schema31.properties.uncertainties.properties.vibrations.anyOf,parentSchema:schema31.properties.uncertainties.properties.vibrations,data:data122};
if(vErrors === null){
vErrors = [err204];
}
else {
vErrors.push(err204);
}
errors++;
}
else {
errors = _errs158;
if(vErrors !== null){
if(_errs158){
vErrors.length = _errs158;
}
else {
vErrors = null;
}
}
}
}
if(data121.scale_factor !== undefined){
let data124 = data121.scale_factor;
if((typeof data124 == "number") && (isFinite(data124))){
if(data124 > 1 || isNaN(data124)){
const err205 = {instancePath:instancePath+"/uncertainties/scale_factor",schemaPath:"#/properties/uncertainties/properties/scale_factor/maximum",keyword:"maximum",params:{comparison: "<=", limit: 1},message:"must be <= 1",schema:1,parentSchema:schema31.properties.uncertainties.properties.scale_factor,data:data124};
if(vErrors === null){
vErrors = [err205];
}
else {
vErrors.push(err205);
}
errors++;
}
if(data124 < 0 || isNaN(data124)){
const err206 = {instancePath:instancePath+"/uncertainties/scale_factor",schemaPath:"#/properties/uncertainties/properties/scale_factor/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema31.properties.uncertainties.properties.scale_factor,data:data124};
if(vErrors === null){
vErrors = [err206];
}
else {
vErrors.push(err206);
}
errors++;
}
}
else {
const err207 = {instancePath:instancePath+"/uncertainties/scale_factor",schemaPath:"#/properties/uncertainties/properties/scale_factor/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.uncertainties.properties.scale_factor.type,parentSchema:schema31.properties.uncertainties.properties.scale_factor,data:data124};
if(vErrors === null){
vErrors = [err207];
}
else {
vErrors.push(err207);
}
errors++;
}
}
if(data121.rotational_constants !== undefined){
let data125 = data121.rotational_constants;
if((typeof data125 == "number") && (isFinite(data125))){
if(data125 > 1 || isNaN(data125)){
const err208 = {instancePath:instancePath+"/uncertainties/rotational_constants",schemaPath:"#/properties/uncertainties/properties/rotational_constants/maximum",keyword:"maximum",params:{comparison: "<=", limit: 1},message:"must be <= 1",schema:1,parentSchema:schema31.properties.uncertainties.properties.rotational_constants,data:data125};
if(vErrors === null){
vErrors = [err208];
}
else {
vErrors.push(err208);
}
errors++;
}
if(data125 < 0 || isNaN(data125)){
const err209 = {instancePath:instancePath+"/uncertainties/rotational_constants",schemaPath:"#/properties/uncertainties/properties/rotational_constants/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema31.properties.uncertainties.properties.rotational_constants,data:data125};
if(vErrors === null){
vErrors = [err209];
}
else {
vErrors.push(err209);
}
errors++;
}
}
else {
const err210 = {instancePath:instancePath+"/uncertainties/rotational_constants",schemaPath:"#/properties/uncertainties/properties/rotational_constants/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.uncertainties.properties.rotational_constants.type,parentSchema:schema31.properties.uncertainties.properties.rotational_constants,data:data125};
if(vErrors === null){
vErrors = [err210];
}
else {
vErrors.push(err210);
}
errors++;
}
}
if(data121.electronic_energies !== undefined){
let data126 = data121.electronic_energies;
if((typeof data126 == "number") && (isFinite(data126))){
if(data126 < 0 || isNaN(data126)){
const err211 = {instancePath:instancePath+"/uncertainties/electronic_energies",schemaPath:"#/properties/uncertainties/properties/electronic_energies/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema31.properties.uncertainties.properties.electronic_energies,data:data126};
if(vErrors === null){
vErrors = [err211];
}
else {
vErrors.push(err211);
}
errors++;
}
}
else {
const err212 = {instancePath:instancePath+"/uncertainties/electronic_energies",schemaPath:"#/properties/uncertainties/properties/electronic_energies/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.uncertainties.properties.electronic_energies.type,parentSchema:schema31.properties.uncertainties.properties.electronic_energies,data:data126};
if(vErrors === null){
vErrors = [err212];
}
else {
vErrors.push(err212);
}
errors++;
}
}
if(data121.barriers !== undefined){
let data127 = data121.barriers;
if((typeof data127 == "number") && (isFinite(data127))){
if(data127 > 1 || isNaN(data127)){
const err213 = {instancePath:instancePath+"/uncertainties/barriers",schemaPath:"#/properties/uncertainties/properties/barriers/maximum",keyword:"maximum",params:{comparison: "<=", limit: 1},message:"must be <= 1",schema:1,parentSchema:schema31.properties.uncertainties.properties.barriers,data:data127};
if(vErrors === null){
vErrors = [err213];
}
else {
vErrors.push(err213);
}
errors++;
}
if(data127 < 0 || isNaN(data127)){
const err214 = {instancePath:instancePath+"/uncertainties/barriers",schemaPath:"#/properties/uncertainties/properties/barriers/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema31.properties.uncertainties.properties.barriers,data:data127};
if(vErrors === null){
vErrors = [err214];
}
else {
vErrors.push(err214);
}
errors++;
}
}
else {
const err215 = {instancePath:instancePath+"/uncertainties/barriers",schemaPath:"#/properties/uncertainties/properties/barriers/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.uncertainties.properties.barriers.type,parentSchema:schema31.properties.uncertainties.properties.barriers,data:data127};
if(vErrors === null){
vErrors = [err215];
}
else {
vErrors.push(err215);
}
errors++;
}
}
if(data121.anharmonic_constants !== undefined){
let data128 = data121.anharmonic_constants;
if((typeof data128 == "number") && (isFinite(data128))){
if(data128 > 1 || isNaN(data128)){
const err216 = {instancePath:instancePath+"/uncertainties/anharmonic_constants",schemaPath:"#/properties/uncertainties/properties/anharmonic_constants/maximum",keyword:"maximum",params:{comparison: "<=", limit: 1},message:"must be <= 1",schema:1,parentSchema:schema31.properties.uncertainties.properties.anharmonic_constants,data:data128};
if(vErrors === null){
vErrors = [err216];
}
else {
vErrors.push(err216);
}
errors++;
}
if(data128 < 0 || isNaN(data128)){
const err217 = {instancePath:instancePath+"/uncertainties/anharmonic_constants",schemaPath:"#/properties/uncertainties/properties/anharmonic_constants/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema31.properties.uncertainties.properties.anharmonic_constants,data:data128};
if(vErrors === null){
vErrors = [err217];
}
else {
vErrors.push(err217);
}
errors++;
}
}
else {
const err218 = {instancePath:instancePath+"/uncertainties/anharmonic_constants",schemaPath:"#/properties/uncertainties/properties/anharmonic_constants/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.uncertainties.properties.anharmonic_constants.type,parentSchema:schema31.properties.uncertainties.properties.anharmonic_constants,data:data128};
if(vErrors === null){
vErrors = [err218];
}
else {
vErrors.push(err218);
}
errors++;
}
}
if(data121.enthalpy_of_formation !== undefined){
let data129 = data121.enthalpy_of_formation;
if((!((typeof data129 == "number") && (isFinite(data129)))) && (!(data129 && typeof data129 == "object" && !Array.isArray(data129)))){
const err219 = {instancePath:instancePath+"/uncertainties/enthalpy_of_formation",schemaPath:"#/properties/uncertainties/properties/enthalpy_of_formation/type",keyword:"type",params:{type: schema31.properties.uncertainties.properties.enthalpy_of_formation.type},message:"must be number,object",schema:schema31.properties.uncertainties.properties.enthalpy_of_formation.type,parentSchema:schema31.properties.uncertainties.properties.enthalpy_of_formation,data:data129};
if(vErrors === null){
vErrors = [err219];
}
else {
vErrors.push(err219);
}
errors++;
}
if((typeof data129 == "number") && (isFinite(data129))){
if(data129 < 0 || isNaN(data129)){
const err220 = {instancePath:instancePath+"/uncertainties/enthalpy_of_formation",schemaPath:"#/properties/uncertainties/properties/enthalpy_of_formation/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema31.properties.uncertainties.properties.enthalpy_of_formation,data:data129};
if(vErrors === null){
vErrors = [err220];
}
else {
vErrors.push(err220);
}
errors++;
}
}
if(data129 && typeof data129 == "object" && !Array.isArray(data129)){
if(data129.value === undefined){
const err221 = {instancePath:instancePath+"/uncertainties/enthalpy_of_formation",schemaPath:"#/properties/uncertainties/properties/enthalpy_of_formation/required",keyword:"required",params:{missingProperty: "value"},message:"must have required property '"+"value"+"'",schema:schema31.properties.uncertainties.properties.enthalpy_of_formation.required,parentSchema:schema31.properties.uncertainties.properties.enthalpy_of_formation,data:data129};
if(vErrors === null){
vErrors = [err221];
}
else {
vErrors.push(err221);
}
errors++;
}
for(const key11 in data129){
if(!((key11 === "value") || (key11 === "unit"))){
const err222 = {instancePath:instancePath+"/uncertainties/enthalpy_of_formation",schemaPath:"#/properties/uncertainties/properties/enthalpy_of_formation/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key11},message:"must NOT have additional properties",schema:false,parentSchema:schema31.properties.uncertainties.properties.enthalpy_of_formation,data:data129};
if(vErrors === null){
vErrors = [err222];
}
else {
vErrors.push(err222);
}
errors++;
}
}
if(data129.value !== undefined){
let data130 = data129.value;
if((typeof data130 == "number") && (isFinite(data130))){
if(data130 < 0 || isNaN(data130)){
const err223 = {instancePath:instancePath+"/uncertainties/enthalpy_of_formation/value",schemaPath:"#/properties/uncertainties/properties/enthalpy_of_formation/properties/value/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema31.properties.uncertainties.properties.enthalpy_of_formation.properties.value,data:data130};
if(vErrors === null){
vErrors = [err223];
}
else {
vErrors.push(err223);
}
errors++;
}
}
else {
const err224 = {instancePath:instancePath+"/uncertainties/enthalpy_of_formation/value",schemaPath:"#/properties/uncertainties/properties/enthalpy_of_formation/properties/value/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.uncertainties.properties.enthalpy_of_formation.properties.value.type,parentSchema:schema31.properties.uncertainties.properties.enthalpy_of_formation.properties.value,data:data130};
if(vErrors === null){
vErrors = [err224];
}
else {
vErrors.push(err224);
}
errors++;
}
}
if(data129.unit !== undefined){
let data131 = data129.unit;
if(!(((data131 === "J/mol") || (data131 === "kJ/mol")) || (data131 === "kcal/mol"))){
const err225 = {instancePath:instancePath+"/uncertainties/enthalpy_of_formation/unit",schemaPath:"#/properties/uncertainties/properties/enthalpy_of_formation/properties/unit/enum",keyword:"enum",params:{allowedValues: schema31.properties.uncertainties.properties.enthalpy_of_formation.properties.unit.enum},message:"must be equal to one of the allowed values",schema:schema31.properties.uncertainties.properties.enthalpy_of_formation.properties.unit.enum,parentSchema:schema31.properties.uncertainties.properties.enthalpy_of_formation.properties.unit,data:data131};
if(vErrors === null){
vErrors = [err225];
}
else {
vErrors.push(err225);
}
errors++;
}
}
}
}
if(data121.molar_mass !== undefined){
let data132 = data121.molar_mass;
if((typeof data132 == "number") && (isFinite(data132))){
if(data132 > 1 || isNaN(data132)){
const err226 = {instancePath:instancePath+"/uncertainties/molar_mass",schemaPath:"#/properties/uncertainties/properties/molar_mass/maximum",keyword:"maximum",params:{comparison: "<=", limit: 1},message:"must be <= 1",schema:1,parentSchema:schema31.properties.uncertainties.properties.molar_mass,data:data132};
if(vErrors === null){
vErrors = [err226];
}
else {
vErrors.push(err226);
}
errors++;
}
if(data132 < 0 || isNaN(data132)){
const err227 = {instancePath:instancePath+"/uncertainties/molar_mass",schemaPath:"#/properties/uncertainties/properties/molar_mass/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema31.properties.uncertainties.properties.molar_mass,data:data132};
if(vErrors === null){
vErrors = [err227];
}
else {
vErrors.push(err227);
}
errors++;
}
}
else {
const err228 = {instancePath:instancePath+"/uncertainties/molar_mass",schemaPath:"#/properties/uncertainties/properties/molar_mass/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.uncertainties.properties.molar_mass.type,parentSchema:schema31.properties.uncertainties.properties.molar_mass,data:data132};
if(vErrors === null){
vErrors = [err228];
}
else {
vErrors.push(err228);
}
errors++;
}
}
}
else {
const err229 = {instancePath:instancePath+"/uncertainties",schemaPath:"#/properties/uncertainties/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema31.properties.uncertainties.type,parentSchema:schema31.properties.uncertainties,data:data121};
if(vErrors === null){
vErrors = [err229];
}
else {
vErrors.push(err229);
}
errors++;
}
}
if(data.temperature_ranges !== undefined){
let data133 = data.temperature_ranges;
if(data133 && typeof data133 == "object" && !Array.isArray(data133)){
if(Object.keys(data133).length < 1){
const err230 = {instancePath:instancePath+"/temperature_ranges",schemaPath:"#/properties/temperature_ranges/minProperties",keyword:"minProperties",params:{limit: 1},message:"must NOT have fewer than 1 properties",schema:1,parentSchema:schema31.properties.temperature_ranges,data:data133};
if(vErrors === null){
vErrors = [err230];
}
else {
vErrors.push(err230);
}
errors++;
}
for(const key12 in data133){
if(!(((key12 === "low") || (key12 === "mid")) || (key12 === "high"))){
const err231 = {instancePath:instancePath+"/temperature_ranges",schemaPath:"#/properties/temperature_ranges/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key12},message:"must NOT have additional properties",schema:false,parentSchema:schema31.properties.temperature_ranges,data:data133};
if(vErrors === null){
vErrors = [err231];
}
else {
vErrors.push(err231);
}
errors++;
}
}
if(data133.low !== undefined){
let data134 = data133.low;
if((typeof data134 == "number") && (isFinite(data134))){
if(data134 <= 0 || isNaN(data134)){
const err232 = {instancePath:instancePath+"/temperature_ranges/low",schemaPath:"#/properties/temperature_ranges/properties/low/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema31.properties.temperature_ranges.properties.low,data:data134};
if(vErrors === null){
vErrors = [err232];
}
else {
vErrors.push(err232);
}
errors++;
}
}
else {
const err233 = {instancePath:instancePath+"/temperature_ranges/low",schemaPath:"#/properties/temperature_ranges/properties/low/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.temperature_ranges.properties.low.type,parentSchema:schema31.properties.temperature_ranges.properties.low,data:data134};
if(vErrors === null){
vErrors = [err233];
}
else {
vErrors.push(err233);
}
errors++;
}
}
if(data133.mid !== undefined){
let data135 = data133.mid;
if((typeof data135 == "number") && (isFinite(data135))){
if(data135 <= 0 || isNaN(data135)){
const err234 = {instancePath:instancePath+"/temperature_ranges/mid",schemaPath:"#/properties/temperature_ranges/properties/mid/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema31.properties.temperature_ranges.properties.mid,data:data135};
if(vErrors === null){
vErrors = [err234];
}
else {
vErrors.push(err234);
}
errors++;
}
}
else {
const err235 = {instancePath:instancePath+"/temperature_ranges/mid",schemaPath:"#/properties/temperature_ranges/properties/mid/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.temperature_ranges.properties.mid.type,parentSchema:schema31.properties.temperature_ranges.properties.mid,data:data135};
if(vErrors === null){
vErrors = [err235];
}
else {
vErrors.push(err235);
}
errors++;
}
}
if(data133.high !== undefined){
let data136 = data133.high;
if((typeof data136 == "number") && (isFinite(data136))){
if(data136 <= 0 || isNaN(data136)){
const err236 = {instancePath:instancePath+"/temperature_ranges/high",schemaPath:"#/properties/temperature_ranges/properties/high/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema31.properties.temperature_ranges.properties.high,data:data136};
if(vErrors === null){
vErrors = [err236];
}
else {
vErrors.push(err236);
}
errors++;
}
}
else {
const err237 = {instancePath:instancePath+"/temperature_ranges/high",schemaPath:"#/properties/temperature_ranges/properties/high/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.temperature_ranges.properties.high.type,parentSchema:schema31.properties.temperature_ranges.properties.high,data:data136};
if(vErrors === null){
vErrors = [err237];
}
else {
vErrors.push(err237);
}
errors++;
}
}
}
else {
const err238 = {instancePath:instancePath+"/temperature_ranges",schemaPath:"#/properties/temperature_ranges/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema31.properties.temperature_ranges.type,parentSchema:schema31.properties.temperature_ranges,data:data133};
if(vErrors === null){
vErrors = [err238];
}
else {
vErrors.push(err238);
}
errors++;
}
}
if(data.tolerances !== undefined){
let data137 = data.tolerances;
if(data137 && typeof data137 == "object" && !Array.isArray(data137)){
if(Object.keys(data137).length < 1){
const err239 = {instancePath:instancePath+"/tolerances",schemaPath:"#/properties/tolerances/minProperties",keyword:"minProperties",params:{limit: 1},message:"must NOT have fewer than 1 properties",schema:1,parentSchema:schema31.properties.tolerances,data:data137};
if(vErrors === null){
vErrors = [err239];
}
else {
vErrors.push(err239);
}
errors++;
}
for(const key13 in data137){
if(!((((key13 === "cp") || (key13 === "h")) || (key13 === "s")) || (key13 === "relative_to_cp"))){
const err240 = {instancePath:instancePath+"/tolerances",schemaPath:"#/properties/tolerances/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key13},message:"must NOT have additional properties",schema:false,parentSchema:schema31.properties.tolerances,data:data137};
if(vErrors === null){
vErrors = [err240];
}
else {
vErrors.push(err240);
}
errors++;
}
}
if(data137.cp !== undefined){
let data138 = data137.cp;
if((typeof data138 == "number") && (isFinite(data138))){
if(data138 <= 0 || isNaN(data138)){
const err241 = {instancePath:instancePath+"/tolerances/cp",schemaPath:"#/properties/tolerances/properties/cp/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema31.properties.tolerances.properties.cp,data:data138};
if(vErrors === null){
vErrors = [err241];
}
else {
vErrors.push(err241);
}
errors++;
}
}
else {
const err242 = {instancePath:instancePath+"/tolerances/cp",schemaPath:"#/properties/tolerances/properties/cp/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.tolerances.properties.cp.type,parentSchema:schema31.properties.tolerances.properties.cp,data:data138};
if(vErrors === null){
vErrors = [err242];
}
else {
vErrors.push(err242);
}
errors++;
}
}
if(data137.h !== undefined){
let data139 = data137.h;
if((typeof data139 == "number") && (isFinite(data139))){
if(data139 <= 0 || isNaN(data139)){
const err243 = {instancePath:instancePath+"/tolerances/h",schemaPath:"#/properties/tolerances/properties/h/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema31.properties.tolerances.properties.h,data:data139};
if(vErrors === null){
vErrors = [err243];
}
else {
vErrors.push(err243);
}
errors++;
}
}
else {
const err244 = {instancePath:instancePath+"/tolerances/h",schemaPath:"#/properties/tolerances/properties/h/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.tolerances.properties.h.type,parentSchema:schema31.properties.tolerances.properties.h,data:data139};
if(vErrors === null){
vErrors = [err244];
}
else {
vErrors.push(err244);
}
errors++;
}
}
if(data137.s !== undefined){
let data140 = data137.s;
if((typeof data140 == "number") && (isFinite(data140))){
if(data140 <= 0 || isNaN(data140)){
const err245 = {instancePath:instancePath+"/tolerances/s",schemaPath:"#/properties/tolerances/properties/s/exclusiveMinimum",keyword:"exclusiveMinimum",params:{comparison: ">", limit: 0},message:"must be > 0",schema:0,parentSchema:schema31.properties.tolerances.properties.s,data:data140};
if(vErrors === null){
vErrors = [err245];
}
else {
vErrors.push(err245);
}
errors++;
}
}
else {
const err246 = {instancePath:instancePath+"/tolerances/s",schemaPath:"#/properties/tolerances/properties/s/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.tolerances.properties.s.type,parentSchema:schema31.properties.tolerances.properties.s,data:data140};
if(vErrors === null){
vErrors = [err246];
}
else {
vErrors.push(err246);
}
errors++;
}
}
if(data137.relative_to_cp !== undefined){
let data141 = data137.relative_to_cp;
if(data141 && typeof data141 == "object" && !Array.isArray(data141)){
if(Object.keys(data141).length < 1){
const err247 = {instancePath:instancePath+"/tolerances/relative_to_cp",schemaPath:"#/properties/tolerances/properties/relative_to_cp/minProperties",keyword:"minProperties",params:{limit: 1},message:"must NOT have fewer than 1 properties",schema:1,parentSchema:schema31.properties.tolerances.properties.relative_to_cp,data:data141};
if(vErrors === null){
vErrors = [err247];
}
else {
vErrors.push(err247);
}
errors++;
}
for(const key14 in data141){
if(!(((key14 === "cp") || (key14 === "h")) || (key14 === "s"))){
const err248 = {instancePath:instancePath+"/tolerances/relative_to_cp",schemaPath:"#/properties/tolerances/properties/relative_to_cp/additionalProperties",keyword:"additionalProperties",params:{additionalProperty: key14},message:"must NOT have additional properties",schema:false,parentSchema:schema31.properties.tolerances.properties.relative_to_cp,data:data141};
if(vErrors === null){
vErrors = [err248];
}
else {
vErrors.push(err248);
}
errors++;
}
}
if(data141.cp !== undefined){
let data142 = data141.cp;
if((typeof data142 == "number") && (isFinite(data142))){
if(data142 < 0 || isNaN(data142)){
const err249 = {instancePath:instancePath+"/tolerances/relative_to_cp/cp",schemaPath:"#/properties/tolerances/properties/relative_to_cp/properties/cp/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema31.properties.tolerances.properties.relative_to_cp.properties.cp,data:data142};
if(vErrors === null){
vErrors = [err249];
}
else {
vErrors.push(err249);
}
errors++;
}
}
else {
const err250 = {instancePath:instancePath+"/tolerances/relative_to_cp/cp",schemaPath:"#/properties/tolerances/properties/relative_to_cp/properties/cp/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.tolerances.properties.relative_to_cp.properties.cp.type,parentSchema:schema31.properties.tolerances.properties.relative_to_cp.properties.cp,data:data142};
if(vErrors === null){
vErrors = [err250];
}
else {
vErrors.push(err250);
}
errors++;
}
}
if(data141.h !== undefined){
let data143 = data141.h;
if((typeof data143 == "number") && (isFinite(data143))){
if(data143 < 0 || isNaN(data143)){
const err251 = {instancePath:instancePath+"/tolerances/relative_to_cp/h",schemaPath:"#/properties/tolerances/properties/relative_to_cp/properties/h/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema31.properties.tolerances.properties.relative_to_cp.properties.h,data:data143};
if(vErrors === null){
vErrors = [err251];
}
else {
vErrors.push(err251);
}
errors++;
}
}
else {
const err252 = {instancePath:instancePath+"/tolerances/relative_to_cp/h",schemaPath:"#/properties/tolerances/properties/relative_to_cp/properties/h/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.tolerances.properties.relative_to_cp.properties.h.type,parentSchema:schema31.properties.tolerances.properties.relative_to_cp.properties.h,data:data143};
if(vErrors === null){
vErrors = [err252];
}
else {
vErrors.push(err252);
}
errors++;
}
}
if(data141.s !== undefined){
let data144 = data141.s;
if((typeof data144 == "number") && (isFinite(data144))){
if(data144 < 0 || isNaN(data144)){
const err253 = {instancePath:instancePath+"/tolerances/relative_to_cp/s",schemaPath:"#/properties/tolerances/properties/relative_to_cp/properties/s/minimum",keyword:"minimum",params:{comparison: ">=", limit: 0},message:"must be >= 0",schema:0,parentSchema:schema31.properties.tolerances.properties.relative_to_cp.properties.s,data:data144};
if(vErrors === null){
vErrors = [err253];
}
else {
vErrors.push(err253);
}
errors++;
}
}
else {
const err254 = {instancePath:instancePath+"/tolerances/relative_to_cp/s",schemaPath:"#/properties/tolerances/properties/relative_to_cp/properties/s/type",keyword:"type",params:{type: "number"},message:"must be number",schema:schema31.properties.tolerances.properties.relative_to_cp.properties.s.type,parentSchema:schema31.properties.tolerances.properties.relative_to_cp.properties.s,data:data144};
if(vErrors === null){
vErrors = [err254];
}
else {
vErrors.push(err254);
}
errors++;
}
}
}
else {
const err255 = {instancePath:instancePath+"/tolerances/relative_to_cp",schemaPath:"#/properties/tolerances/properties/relative_to_cp/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema31.properties.tolerances.properties.relative_to_cp.type,parentSchema:schema31.properties.tolerances.properties.relative_to_cp,data:data141};
if(vErrors === null){
vErrors = [err255];
}
else {
vErrors.push(err255);
}
errors++;
}
}
}
else {
const err256 = {instancePath:instancePath+"/tolerances",schemaPath:"#/properties/tolerances/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema31.properties.tolerances.type,parentSchema:schema31.properties.tolerances,data:data137};
if(vErrors === null){
vErrors = [err256];
}
else {
vErrors.push(err256);
}
errors++;
}
}
}
else {
const err257 = {instancePath,schemaPath:"#/type",keyword:"type",params:{type: "object"},message:"must be object",schema:schema31.type,parentSchema:schema31,data};
if(vErrors === null){
vErrors = [err257];
}
else {
vErrors.push(err257);
}
errors++;
}
validate20.errors = vErrors;
return errors === 0;
}
validate20.evaluated = {"props":true,"dynamicProps":false,"dynamicItems":false};

