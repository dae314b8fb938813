// Tag text for the view's users.
#include "studies/study_view.h"

namespace lineward {

std::string StudyView::tag(PartId id) const {
    const Part* p = drawing.part(id);
    return p && !p->tag.empty() ? p->tag : "#" + std::to_string(id.value);
}

} // namespace lineward
