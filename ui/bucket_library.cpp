// Bucket library files: the names are the user's, checked so a name cannot leave the folder.
#include "bucket_library.h"

#include <QCoreApplication>
#include <QDir>
#include <QStandardPaths>

namespace lineward::ui {

namespace {
QString tr(const char* s) {
    return QCoreApplication::translate("BucketLibrary", s);
}
constexpr const char* kSuffix = ".lineward";
} // namespace

QString bucketLibraryDir() {
    return QStandardPaths::writableLocation(QStandardPaths::AppDataLocation) + "/bucket-templates";
}

QStringList bucketTemplateNames() {
    QStringList names;
    const QDir dir(bucketLibraryDir());
    for (const QString& f :
         dir.entryList({QStringLiteral("*") + kSuffix}, QDir::Files, QDir::Name | QDir::IgnoreCase))
        names << f.chopped(static_cast<int>(qstrlen(kSuffix)));
    return names;
}

QString saveBucketTemplate(const Drawing& fragment, const QString& name) {
    const QString n = name.trimmed();
    if (n.isEmpty())
        return tr("the template needs a name");
    if (n.contains('/') || n.contains('\\') || n.startsWith('.') || n.size() > 120)
        return tr("'%1' cannot be a template name: no slashes, no leading dot, at most 120 "
                  "characters")
            .arg(n);
    if (!QDir().mkpath(bucketLibraryDir()))
        return tr("cannot create the library folder %1").arg(bucketLibraryDir());
    const QString path = bucketLibraryDir() + "/" + n + kSuffix;
    if (auto why = io::saveDrawing(fragment, path.toStdString()))
        return QString::fromStdString(*why);
    return {};
}

io::LoadResult loadBucketTemplate(const QString& name) {
    return io::loadDrawing((bucketLibraryDir() + "/" + name + kSuffix).toStdString());
}

} // namespace lineward::ui
