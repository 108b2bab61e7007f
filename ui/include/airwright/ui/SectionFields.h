#pragma once
// The inputs of each section type as form fields: label, unit, tooltip and how to
// read and write them on a Section. The section editor builds its form from this
// list, so adding a section type means adding its fields here.

#include "airwright/core/chain/Section.h"
#include "airwright/ui/FieldSpec.h"

#include <vector>

namespace Airwright::Ui {

class SectionFields {
public:
    using Spec = FieldSpec<Core::Chain::Section>;

    // The id first, then the type's own inputs, the length last.
    static std::vector<Spec> fieldsFor(const Core::Chain::SectionSpec& spec);
};

} // namespace Airwright::Ui
