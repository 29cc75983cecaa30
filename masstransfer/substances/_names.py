"""Names people use for substances that the databases do not resolve, or resolve to one of several.

Plant abbreviations, generic names and formulas shared by several compounds.  None of these
is a published table: every row is common practice in process plants and laboratories, and
every target is given by CAS number so that the database decides nothing.
"""

from __future__ import annotations

import re
from types import MappingProxyType
from typing import Final

__all__ = [
    "ALIASES",
    "AMBIGUOUS",
    "AMBIGUOUS_DEFAULTS",
    "BARE_ATOMS",
    "CAS_PREFIX",
    "COMMON_NAMES",
    "DISPLAY_NAMES",
    "UNCLEAR_ABBREVIATIONS",
    "UNCLEAR_NAMES",
]

#: Plant abbreviations (upper-cased key) -> CAS number.  Every row: common practice.
ALIASES: Final = MappingProxyType(
    {
        "IPA": "67-63-0",  # isopropanol (isopropyl alcohol); common practice
        "DCM": "75-09-2",  # dichloromethane; common practice
        "THF": "109-99-9",  # tetrahydrofuran; common practice
        "DMF": "68-12-2",  # N,N-dimethylformamide; common practice
        "DMSO": "67-68-5",  # dimethyl sulfoxide; common practice
        "MEK": "78-93-3",  # methyl ethyl ketone (2-butanone); common practice
        "MIBK": "108-10-1",  # methyl isobutyl ketone; common practice
        "NMP": "872-50-4",  # N-methyl-2-pyrrolidone; common practice
        "DMAC": "127-19-5",  # N,N-dimethylacetamide; common practice
        "MTBE": "1634-04-4",  # methyl tert-butyl ether; common practice
        "ETOAC": "141-78-6",  # ethyl acetate; common practice
        "IPAC": "108-21-4",  # isopropyl acetate; common practice
        "BUOAC": "123-86-4",  # n-butyl acetate; common practice
        "MEOH": "67-56-1",  # methanol; common practice
        "ETOH": "64-17-5",  # ethanol; common practice
        "MECN": "75-05-8",  # acetonitrile; common practice
        "ACN": "75-05-8",  # acetonitrile; common practice
        "MEG": "107-21-1",  # (mono)ethylene glycol; common practice
        "MPG": "57-55-6",  # (mono)propylene glycol; common practice
        "DEG": "111-46-6",  # diethylene glycol; common practice
        "MEA": "141-43-5",  # monoethanolamine; common practice
        "DMC": "616-38-6",  # dimethyl carbonate; common practice
        "PERC": "127-18-4",  # tetrachloroethylene (perchloroethylene); common practice
        "CTC": "56-23-5",  # carbon tetrachloride; common practice
        # gas-treating amines and glycols (the database's own synonyms give other substances)
        "DEA": "111-42-2",  # diethanolamine; common practice
        "MDEA": "105-59-9",  # N-methyldiethanolamine; common practice
        "DGA": "929-06-6",  # diglycolamine, 2-(2-aminoethoxy)ethanol; common practice
        "PZ": "110-85-0",  # piperazine; common practice
        "TEG": "112-27-6",  # triethylene glycol; common practice
        "PG": "57-55-6",  # propylene glycol, 1,2-propanediol; common practice
        "EG": "107-21-1",  # ethylene glycol; common practice
        # solvents and intermediates
        "DIBK": "108-83-8",  # diisobutyl ketone; common practice
        "MAK": "110-43-0",  # methyl amyl ketone, 2-heptanone; common practice
        "EGBE": "111-76-2",  # ethylene glycol monobutyl ether, 2-butoxyethanol; common practice
        "PGME": "107-98-2",  # propylene glycol methyl ether, 1-methoxy-2-propanol; common practice
        "PGMEA": "108-65-6",  # propylene glycol methyl ether acetate; common practice
        "DIPE": "108-20-3",  # diisopropyl ether; common practice
        "DEE": "60-29-7",  # diethyl ether; common practice
        "IPE": "108-20-3",  # isopropyl ether, diisopropyl ether; common practice
        "MEOAC": "79-20-9",  # methyl acetate; common practice
        "ACOH": "64-19-7",  # acetic acid; common practice
        "HAC": "64-19-7",  # acetic acid; common practice
        "MCH": "108-87-2",  # methylcyclohexane; common practice
        "EDC": "107-06-2",  # ethylene dichloride, 1,2-dichloroethane; common practice
        "VCM": "75-01-4",  # vinyl chloride monomer; common practice
        "VAM": "108-05-4",  # vinyl acetate monomer; common practice
        "MMA": "80-62-6",  # methyl methacrylate; common practice
        "MCB": "108-90-7",  # monochlorobenzene; common practice
        "ODCB": "95-50-1",  # ortho-dichlorobenzene; common practice
        "ECH": "106-89-8",  # epichlorohydrin; common practice
        "DMDS": "624-92-0",  # dimethyl disulfide; common practice
        "IBA": "78-83-1",  # isobutanol (isobutyl alcohol); common practice
        "BUOH": "71-36-3",  # n-butanol; common practice
        # commercial isomer mixtures: the straight chain, with the ambiguity warning below
        # condensed structural formulas, which the database reads as a bare formula and resolves
        # to an isomer (C2H5OH as dimethyl ether)
        "C2H5OH": "64-17-5",  # ethanol; common practice
        "CH3CH2OH": "64-17-5",  # ethanol; common practice
        "CH3OH": "67-56-1",  # methanol; common practice
        "CH3COOH": "64-19-7",  # acetic acid; common practice
        "HCOOH": "64-18-6",  # formic acid; common practice
        "CH3COCH3": "67-64-1",  # acetone; common practice
        "CH3CHO": "75-07-0",  # acetaldehyde; common practice
        "HCHO": "50-00-0",  # formaldehyde; common practice
        "CH3CN": "75-05-8",  # acetonitrile; common practice
        "C6H5CH3": "108-88-3",  # toluene; common practice
        "C6H5OH": "108-95-2",  # phenol; common practice
        "PHOH": "108-95-2",  # phenol; common practice
        "C6H5NH2": "62-53-3",  # aniline; common practice
        "CH3COOC2H5": "141-78-6",  # ethyl acetate; common practice
        "C2H5OC2H5": "60-29-7",  # diethyl ether; common practice
        "HEXANES": "110-54-3",  # n-hexane for "hexanes"; common practice
        "HEPTANES": "142-82-5",  # n-heptane for "heptanes"; common practice
        "XYLENES": "95-47-6",  # o-xylene, as for "xylene", with the ambiguity warning; common practice
        "MIXED XYLENES": "95-47-6",  # o-xylene stands in (no record of the mixture), with the warning
    }
)

#: Abbreviations that mean different substances in different trades: refused with the
#: candidates rather than guessed (upper-cased key) -> (name, CAS) of each.  Common practice.
UNCLEAR_ABBREVIATIONS: Final = MappingProxyType(
    {
        "TEA": (("triethanolamine", "102-71-6"), ("triethylamine", "121-44-8")),
        "DIPA": (("diisopropanolamine", "110-97-4"), ("diisopropylamine", "108-18-9")),
        "AMP": (("2-amino-2-methyl-1-propanol", "124-68-5"), ("adenosine monophosphate", "61-19-8")),
        "TCA": (("1,1,1-trichloroethane", "71-55-6"), ("trichloroacetic acid", "76-03-9")),
        "DCE": (
            ("1,2-dichloroethane", "107-06-2"),
            ("1,1-dichloroethene", "75-35-4"),
            ("cis-1,2-dichloroethene", "156-59-2"),
        ),
        "NBA": (("n-butanol", "71-36-3"), ("n-butyl acetate", "123-86-4")),
        "TBA": (("tert-butanol", "75-65-0"), ("tert-butylamine", "75-64-9")),
    }
)

#: Generic names that mean different substances in different trades: refused with the candidates
#: (lower-cased key) -> (which trade means which, the (name, CAS) of each).  "Glycol" is
#: triethylene glycol in gas dehydration and ethylene glycol in coolants and antifreeze.
#: Common practice.
_GLYCOLS: Final = (
    "in gas dehydration usually TEG, in coolants and antifreeze MEG",
    (
        ("MEG (monoethylene glycol)", "107-21-1"),
        ("DEG (diethylene glycol)", "111-46-6"),
        ("TEG (triethylene glycol)", "112-27-6"),
    ),
)
UNCLEAR_NAMES: Final = MappingProxyType({"glycol": _GLYCOLS, "glycols": _GLYCOLS})

#: Bare symbols of elements whose everyday substance is a molecule (written exactly so, or in
#: capitals): the databases resolve them to the free atom, a radical no process stream carries.
#: Refused, naming what was probably meant: symbol -> (what it probably meant, CAS of the atom).
#: Common practice; CAS numbers of the substances as in the chemicals database.
BARE_ATOMS: Final = MappingProxyType(
    {
        "H": ("hydrogen H2 (CAS 1333-74-0)", "12385-13-6"),
        "N": ("nitrogen N2 (CAS 7727-37-9)", "17778-88-0"),
        "O": ("oxygen O2 (CAS 7782-44-7) or ozone O3 (CAS 10028-15-6)", "17778-80-2"),
        "F": ("fluorine F2 (CAS 7782-41-4), hydrogen fluoride HF (CAS 7664-39-3) or a fluoride salt",
              "14762-94-8"),
        "Cl": ("chlorine Cl2 (CAS 7782-50-5), hydrogen chloride HCl (CAS 7647-01-0) or a chloride "
               "salt such as sodium chloride NaCl (CAS 7647-14-5)", "22537-15-1"),
        "Br": ("bromine Br2 (CAS 7726-95-6), hydrogen bromide HBr (CAS 10035-10-6) or a bromide salt",
               "10097-32-2"),
        "I": ("iodine I2 (CAS 7553-56-2), hydrogen iodide HI (CAS 10034-85-2) or an iodide salt",
              "14362-44-8"),
    }
)  # fmt: skip

#: Names shown for a CAS number where the database's common name describes another phase or
#: form: the gas is hydrogen chloride, its aqueous solution hydrochloric acid.  Common practice.
DISPLAY_NAMES: Final = MappingProxyType(
    {
        "7647-01-0": "hydrogen chloride",  # not "hydrochloric acid", the aqueous solution
        "7664-39-3": "hydrogen fluoride",  # not "hydrofluoric acid"
    }
)

#: "CAS 67-64-1", "CAS: 67-64-1", "CAS-No. 67-64-1", "CAS RN 67-64-1": the number alone resolves.
CAS_PREFIX: Final = re.compile(
    r"^\s*CAS(?:\s*-?\s*(?:No\.?|RN|number))?\s*[:#]?\s*(\d{2,7}-\d{2}-\d)\s*$", re.I
)

#: Generic names and formulas the databases resolve to one of several substances
#: (lower-cased key) -> the (name, CAS) of the common members.  Common practice.
AMBIGUOUS: Final = MappingProxyType(
    {
        "xylene": (("o-xylene", "95-47-6"), ("m-xylene", "108-38-3"), ("p-xylene", "106-42-3"),
                   ("mixed xylenes", "1330-20-7")),
        # the commercial mixture (CAS 1330-20-7) has no record of its own in the database
        "mixed xylenes": (("o-xylene", "95-47-6"), ("m-xylene", "108-38-3"), ("p-xylene", "106-42-3"),
                          ("ethylbenzene", "100-41-4")),
        "xylenes": (("o-xylene", "95-47-6"), ("m-xylene", "108-38-3"), ("p-xylene", "106-42-3"),
                    ("mixed xylenes", "1330-20-7")),
        "butanol": (("1-butanol", "71-36-3"), ("2-butanol", "78-92-2"), ("isobutanol", "78-83-1"),
                    ("tert-butanol", "75-65-0")),
        "propanol": (("1-propanol", "71-23-8"), ("isopropanol", "67-63-0")),
        "pentanol": (("1-pentanol", "71-41-0"), ("isoamyl alcohol", "123-51-3")),
        "amyl alcohol": (("1-pentanol", "71-41-0"), ("isoamyl alcohol", "123-51-3")),
        "cresol": (("o-cresol", "95-48-7"), ("m-cresol", "108-39-4"), ("p-cresol", "106-44-5")),
        "dichlorobenzene": (("1,2-dichlorobenzene", "95-50-1"), ("1,3-dichlorobenzene", "541-73-1"),
                            ("1,4-dichlorobenzene", "106-46-7")),
        "dichloroethane": (("1,2-dichloroethane", "107-06-2"), ("1,1-dichloroethane", "75-34-3")),
        "trichloroethane": (("1,1,1-trichloroethane", "71-55-6"), ("1,1,2-trichloroethane", "79-00-5")),
        "butene": (("1-butene", "106-98-9"), ("cis-2-butene", "590-18-1"), ("trans-2-butene", "624-64-6"),
                   ("isobutene", "115-11-7")),
        "c2h6o": (("ethanol", "64-17-5"), ("dimethyl ether", "115-10-6")),
        "c3h8o": (("1-propanol", "71-23-8"), ("isopropanol", "67-63-0"),
                  ("methyl ethyl ether", "540-67-0")),
        "c4h10o": (("1-butanol", "71-36-3"), ("2-butanol", "78-92-2"), ("isobutanol", "78-83-1"),
                   ("tert-butanol", "75-65-0"), ("diethyl ether", "60-29-7")),
        "c8h10": (("o-xylene", "95-47-6"), ("m-xylene", "108-38-3"), ("p-xylene", "106-42-3"),
                  ("ethylbenzene", "100-41-4")),
        "c3h6o": (("acetone", "67-64-1"), ("propanal", "123-38-6"), ("propylene oxide", "75-56-9"),
                  ("allyl alcohol", "107-18-6")),
        "c4h8o": (("methyl ethyl ketone", "78-93-3"), ("tetrahydrofuran", "109-99-9"),
                  ("butanal", "123-72-8")),
        "c4h8o2": (("ethyl acetate", "141-78-6"), ("1,4-dioxane", "123-91-1"), ("butyric acid", "107-92-6"),
                   ("methyl propionate", "554-12-1")),
        "c3h6o2": (("propionic acid", "79-09-4"), ("methyl acetate", "79-20-9"),
                   ("ethyl formate", "109-94-4")),
        "c2h4o2": (("acetic acid", "64-19-7"), ("methyl formate", "107-31-3")),
        "c7h8o": (("anisole", "100-66-3"), ("benzyl alcohol", "100-51-6"), ("o-cresol", "95-48-7"),
                  ("m-cresol", "108-39-4"), ("p-cresol", "106-44-5")),
        "c6h12": (("cyclohexane", "110-82-7"), ("1-hexene", "592-41-6"), ("methylcyclopentane", "96-37-7")),
        "c5h12": (("n-pentane", "109-66-0"), ("isopentane", "78-78-4"), ("neopentane", "463-82-1")),
        "c6h14": (("n-hexane", "110-54-3"), ("2-methylpentane", "107-83-5"), ("3-methylpentane", "96-14-0")),
        "c4h10": (("n-butane", "106-97-8"), ("isobutane", "75-28-5")),
        "hexanes": (("n-hexane", "110-54-3"), ("2-methylpentane", "107-83-5"), ("3-methylpentane", "96-14-0"),
                    ("methylcyclopentane", "96-37-7")),
        "heptanes": (("n-heptane", "142-82-5"), ("2-methylhexane", "591-76-4"),
                     ("3-methylhexane", "589-34-4")),
        "c3h6": (("propylene", "115-07-1"), ("cyclopropane", "75-19-4")),
        "c2h4cl2": (("1,2-dichloroethane", "107-06-2"), ("1,1-dichloroethane", "75-34-3")),
        "c9h12": (("cumene", "98-82-8"), ("n-propylbenzene", "103-65-1"), ("mesitylene", "108-67-8")),
    }
)  # fmt: skip

#: The member an ambiguous formula resolves to where one isomer is overwhelmingly what is meant
#: (Hill formula, lower-cased -> CAS); the others keep the database's choice.  Common practice.
AMBIGUOUS_DEFAULTS: Final = MappingProxyType(
    {
        "c2h6o": "64-17-5",  # ethanol, the solvent, rather than dimethyl ether
    }
)

#: Everyday names offered as close-match suggestions for a name that is not found.
COMMON_NAMES: Final = (
    "air", "nitrogen", "oxygen", "argon", "helium", "hydrogen", "carbon dioxide", "carbon monoxide",
    "methane", "ethane", "propane", "butane", "ethylene", "propylene", "acetylene", "ammonia",
    "sulfur dioxide", "hydrogen sulfide", "chlorine", "water", "steam", "nitrous oxide",
    "methanol", "ethanol", "1-propanol", "isopropanol", "1-butanol", "2-butanol", "isobutanol",
    "tert-butanol", "1-pentanol", "1-hexanol", "1-octanol", "2-ethylhexanol", "cyclohexanol",
    "benzyl alcohol", "acetone", "methyl ethyl ketone", "methyl isobutyl ketone", "cyclohexanone",
    "acetophenone", "methyl acetate", "ethyl acetate", "isopropyl acetate", "butyl acetate",
    "ethyl formate", "methyl methacrylate", "vinyl acetate", "diethyl ether", "tetrahydrofuran",
    "1,4-dioxane", "methyl tert-butyl ether", "diisopropyl ether", "anisole", "dichloromethane",
    "chloroform", "carbon tetrachloride", "1,2-dichloroethane", "trichloroethylene",
    "tetrachloroethylene", "chlorobenzene", "benzene", "toluene", "o-xylene", "m-xylene", "p-xylene",
    "ethylbenzene", "styrene", "cumene", "nitrobenzene", "naphthalene", "n-pentane", "n-hexane",
    "n-heptane", "n-octane", "isooctane", "cyclohexane", "methylcyclohexane", "n-decane",
    "N,N-dimethylformamide", "N,N-dimethylacetamide", "N-methyl-2-pyrrolidone", "formamide",
    "dimethyl sulfoxide", "sulfolane", "ethylene glycol", "propylene glycol", "diethylene glycol",
    "glycerol", "triethylamine", "diethylamine", "aniline", "pyridine", "ethanolamine", "morpholine",
    "acetic acid", "formic acid", "propionic acid", "acetonitrile", "propionitrile",
    "propylene carbonate", "dimethyl carbonate", "diethyl carbonate", "carbon disulfide", "phenol",
    "hydrogen peroxide", "ozone", "formaldehyde", "acetaldehyde", "vinyl chloride",
    "triethylene glycol", "diethanolamine", "N-methyldiethanolamine", "piperazine",
    "hydrogen chloride", "hydrogen fluoride", "hydrogen cyanide", "sodium chloride",
    "mixed xylenes", "monoethylene glycol",
)  # fmt: skip
